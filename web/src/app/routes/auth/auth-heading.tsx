import type { ReactNode } from 'react';
import { palette } from '@/config/theme';

export type AuthHeadingProps = { title: string; subtitle?: ReactNode };

/** Plain markup on purpose: the sign-in route is the first load, and antd's Typography would add its whole module. */
export function AuthHeading({ title, subtitle }: AuthHeadingProps) {
  return (
    <div style={{ marginBottom: 20 }}>
      <h3 style={{ margin: 0, fontSize: 24, lineHeight: 1.35, fontWeight: 600, color: palette.ink }}>{title}</h3>
      {subtitle && <span style={{ color: palette.inkMuted }}>{subtitle}</span>}
    </div>
  );
}
