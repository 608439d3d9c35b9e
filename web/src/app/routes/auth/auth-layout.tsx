import { Suspense } from 'react';
import { Outlet } from 'react-router-dom';
import { palette, spacing } from '@/config/theme';
import { Logo } from '@/components/logo';

const points = [
  'Measure the chassis once, with photos, and keep the figures with the job.',
  'See what fits, what is tight and what fails before a part is ordered.',
  'Turn the plan into a quote your customer can approve online.',
];

/**
 * The sign-in pages are the first load: plain markup for the frame (no antd Card, Typography or Skeleton), so the
 * first JavaScript holds only what the forms need.
 */
const cardStyle = {
  width: '100%',
  maxWidth: 420,
  padding: spacing.xl,
  background: palette.white,
  border: `1px solid ${palette.line}`,
  borderRadius: 8,
  boxSizing: 'border-box',
} as const;

export function AuthLayout() {
  return (
    <div style={{ minHeight: '100vh', display: 'flex', flexWrap: 'wrap', background: palette.paper }}>
      <aside
        style={{
          flex: '1 1 380px',
          background: `linear-gradient(160deg, ${palette.teal900} 0%, ${palette.teal700} 100%)`,
          color: palette.white,
          padding: `${spacing.xl * 1.5}px ${spacing.xl * 1.5}px`,
          display: 'flex',
          flexDirection: 'column',
          justifyContent: 'space-between',
          gap: spacing.xl,
        }}
      >
        <Logo tone="light" size={34} />
        <div style={{ maxWidth: 440 }}>
          <h1 style={{ color: palette.white, fontWeight: 600, fontSize: 34, lineHeight: 1.15, margin: '0 0 0.5em' }}>
            Plan the swap. Check the fit. Quote it right.
          </h1>
          <ul style={{ paddingInlineStart: 20, margin: 0, color: '#cfe0de', fontSize: 16, lineHeight: 1.6 }}>
            {points.map((p) => (
              <li key={p} style={{ marginBottom: 6 }}>
                {p}
              </li>
            ))}
          </ul>
        </div>
        <span style={{ color: '#8fb0ad', fontSize: 13 }}>A planning aid for shops and owner-builders. Measure before you cut.</span>
      </aside>
      <main style={{ flex: '1 1 420px', display: 'grid', placeItems: 'center', padding: spacing.lg }}>
        <section style={cardStyle}>
          <Suspense
            fallback={
              <div data-testid="loading" aria-busy="true" aria-live="polite" style={{ color: palette.inkMuted }}>
                Loading…
              </div>
            }
          >
            <Outlet />
          </Suspense>
        </section>
      </main>
    </div>
  );
}
