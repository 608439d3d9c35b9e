import { Flex, Typography } from 'antd';
import type { ReactNode } from 'react';

export type PageHeaderProps = { title: ReactNode; subtitle?: ReactNode; extra?: ReactNode; eyebrow?: ReactNode };

export function PageHeader({ title, subtitle, extra, eyebrow }: PageHeaderProps) {
  return (
    <Flex justify="space-between" align="flex-end" gap={16} wrap style={{ marginBottom: 20 }}>
      <div>
        {eyebrow && (
          <Typography.Text type="secondary" style={{ textTransform: 'uppercase', letterSpacing: '0.08em', fontSize: 12, fontWeight: 600 }}>
            {eyebrow}
          </Typography.Text>
        )}
        <Typography.Title level={2} style={{ margin: 0, fontWeight: 600 }}>
          {title}
        </Typography.Title>
        {subtitle && <Typography.Text type="secondary">{subtitle}</Typography.Text>}
      </div>
      {/* the page's commands wrap under each other on a phone instead of pushing the page wider */}
      {extra && (
        <Flex gap={8} wrap>
          {extra}
        </Flex>
      )}
    </Flex>
  );
}
