import { palette } from '@/config/theme';
import { LogoMark } from '@/components/logo';

export type FullPageSplashProps = { label?: string };

/** Shown while the first chunks or the account load; plain markup so it costs almost nothing. */
export function FullPageSplash({ label = 'Loading…' }: FullPageSplashProps) {
  return (
    <div
      role="status"
      aria-live="polite"
      style={{
        minHeight: '100vh',
        display: 'grid',
        placeItems: 'center',
        background: palette.paper,
        color: palette.inkMuted,
      }}
    >
      <div style={{ display: 'grid', justifyItems: 'center', gap: 12 }}>
        <LogoMark size={44} />
        <span>{label}</span>
      </div>
    </div>
  );
}
