import { Typography } from 'antd';
import type { ReactNode } from 'react';

export type AuthHeadingProps = { title: string; subtitle?: ReactNode };

export function AuthHeading({ title, subtitle }: AuthHeadingProps) {
  return (
    <div style={{ marginBottom: 20 }}>
      <Typography.Title level={3} style={{ margin: 0, fontWeight: 600 }}>
        {title}
      </Typography.Title>
      {subtitle && <Typography.Text type="secondary">{subtitle}</Typography.Text>}
    </div>
  );
}
