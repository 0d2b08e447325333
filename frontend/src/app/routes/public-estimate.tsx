import { useParams } from 'react-router-dom';
import { Brand } from '@/components/layouts/brand';
import { palette } from '@/config/theme';
import { PublicEstimateView } from '@/features/estimates/components/public-estimate-view';

/** The vehicle owner's page, opened from the e-mail: no account, no navigation. */
export function Component() {
  const { token = '' } = useParams();
  return (
    <div style={{ minHeight: '100vh', background: palette.grey50 }}>
      <header style={{ background: palette.white, borderBottom: `1px solid ${palette.grey200}`, padding: '12px clamp(16px, 4vw, 48px)' }}>
        <Brand />
      </header>
      <main style={{ maxWidth: 960, margin: '0 auto', padding: '24px clamp(16px, 4vw, 48px) 48px' }}>
        <div style={{ background: palette.white, borderRadius: 8, padding: 'clamp(16px, 3vw, 32px)', border: `1px solid ${palette.grey200}` }}>
          <PublicEstimateView token={token} />
        </div>
      </main>
    </div>
  );
}
