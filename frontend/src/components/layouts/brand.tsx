import { palette } from '@/config/theme';

type BrandProps = { size?: 'small' | 'large'; collapsed?: boolean };

/** The product's mark: three stepping stones, the fix path in miniature. */
export function Brand({ size = 'small', collapsed = false }: BrandProps) {
  const mark = size === 'large' ? 40 : 32;
  return (
    <span style={{ display: 'inline-flex', alignItems: 'center', gap: 10 }}>
      <svg width={mark} height={mark} viewBox="0 0 32 32" aria-hidden focusable="false">
        <rect width="32" height="32" rx="7" fill={palette.teal600} />
        <circle cx="8" cy="22" r="3.5" fill="#fff" />
        <circle cx="16" cy="16" r="3.5" fill="#fff" opacity="0.85" />
        <circle cx="24" cy="10" r="3.5" fill="#fff" opacity="0.7" />
      </svg>
      <span
        style={{
          fontSize: size === 'large' ? 30 : 22,
          fontWeight: 700,
          color: palette.teal700,
          letterSpacing: 0.2,
          ...(collapsed ? { position: 'absolute', width: 1, height: 1, overflow: 'hidden', clip: 'rect(0 0 0 0)' } : {}),
        }}
      >
        Causeway
      </span>
    </span>
  );
}
