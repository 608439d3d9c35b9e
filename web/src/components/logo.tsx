import { palette } from '@/config/theme';

export type LogoMarkProps = { size?: number; tone?: 'light' | 'dark'; title?: string };

/**
 * The Swapwright mark: an engine block (valve cover, block, sump) held in the open ring
 * of a box-end wrench, the ring's gap forming the jaw.
 */
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
      {/* wrench ring, open at the upper right like a jaw */}
      <path
        d="M35.3 9.6 A18 18 0 1 0 40.6 17.8"
        fill="none"
        stroke={ring}
        strokeWidth="4.5"
        strokeLinecap="round"
      />
      {/* wrench handle */}
      <path d="M10.8 37.8 L4.5 44.1" stroke={ring} strokeWidth="5.5" strokeLinecap="round" />
      {/* valve cover */}
      <rect x="15" y="13.5" width="18" height="4" rx="1.2" fill={palette.oxide500} />
      {/* block with exhaust-side ears */}
      <path d="M13 19 H35 V22 H37.5 V27 H35 V30 H13 V27 H10.5 V22 H13 Z" fill={block} />
      {/* sump */}
      <path d="M15 31.5 H33 L31 36 H17 Z" fill={block} />
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
