import { palette } from '@/config/theme';

/**
 * Shown while a page's code loads. Plain markup on purpose: it is on the first-load path,
 * where every antd component imported adds to what the browser must fetch before anything shows.
 */
export function PageLoader() {
  return (
    <div role="status" aria-live="polite" className="page-loader">
      <span className="page-loader-dot" style={{ background: palette.teal600 }} aria-hidden />
      <span className="page-loader-dot" style={{ background: palette.teal500 }} aria-hidden />
      <span className="page-loader-dot" style={{ background: palette.teal300 }} aria-hidden />
      <span className="page-loader-text">Loading…</span>
    </div>
  );
}
