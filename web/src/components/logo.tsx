import { palette } from '@/config/theme';

export type LogoMarkProps = { size?: number; tone?: 'light' | 'dark'; title?: string };

/** The Swapwright mark: an engine block (valve cover, block, sump) held in the box end of a combination wrench. */
export function LogoMark({ size = 32, tone = 'dark', title }: LogoMarkProps) {
  const ring = tone === 'light' ? palette.teal100 : palette.teal600;
  const block = tone === 'light' ? palette.white : palette.teal800;
  return (
    <svg
      width={size}
      height={size}
      viewBox="0 0 48 48"
      role={title ? 'img' : undefined}
      aria-hidden={title ? undefined : true}
      aria-label={title}
      focusable="false"
    >
      {/* combination wrench: box end with a hex opening, handle to the lower left */}
      <path
        fillRule="evenodd"
        fill={ring}
        d="M11 21 A16 16 0 1 0 43 21 A16 16 0 1 0 11 21 Z M38.5 21 L32.75 30.96 L21.25 30.96 L15.5 21 L21.25 11.04 L32.75 11.04 Z"
      />
      <path d="M17 31 L10.5 37.5" stroke={ring} strokeWidth="6.5" strokeLinecap="round" />
      {/* open-end jaw at the far end of the handle */}
      <path d="M4.52 39.39 A4.5 4.5 0 1 1 8.61 43.48" fill="none" stroke={ring} strokeWidth="4" />
      {/* valve cover */}
      <rect x="21" y="13.4" width="12" height="3" rx="1" fill={palette.oxide500} />
      {/* block with manifold ears */}
      <path d="M20 17.6 H34 V19.2 H35.6 V22.8 H34 V24.4 H20 V22.8 H18.4 V19.2 H20 Z" fill={block} />
      {/* sump */}
      <path d="M21.4 25.4 H32.6 L31.2 28.8 H22.8 Z" fill={block} />
    </svg>
  );
}

export type LogoProps = { tone?: 'light' | 'dark'; size?: number };

export function Logo({ tone = 'dark', size = 30 }: LogoProps) {
  return (
    <span style={{ display: 'inline-flex', alignItems: 'center', gap: 10 }} data-testid="logo">
      <LogoMark size={size} tone={tone} />
      <span
        style={{
          fontWeight: 600,
          fontSize: size * 0.66,
          letterSpacing: '0.01em',
          color: tone === 'light' ? palette.white : palette.teal800,
        }}
      >
        Swap<span style={{ color: tone === 'light' ? palette.brass500 : palette.oxide500 }}>wright</span>
      </span>
    </span>
  );
}
