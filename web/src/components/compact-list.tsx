import { Typography } from 'antd';
import type { ReactNode } from 'react';
import { palette } from '@/config/theme';

export type CompactListItem = { key: string; title: ReactNode; description?: ReactNode; extra?: ReactNode };

export type CompactListProps = { items: CompactListItem[]; label: string };

/** A plain, accessible list for dashboard panels. */
export function CompactList({ items, label }: CompactListProps) {
  return (
    <ul aria-label={label} style={{ listStyle: 'none', margin: 0, padding: 0 }}>
      {items.map((item, i) => (
        <li
          key={item.key}
          style={{
            display: 'flex',
            justifyContent: 'space-between',
            alignItems: 'center',
            gap: 12,
            padding: '10px 0',
            borderTop: i === 0 ? undefined : `1px solid ${palette.line}`,
          }}
        >
          <div style={{ minWidth: 0 }}>
            <div style={{ fontWeight: 600 }}>{item.title}</div>
            {item.description && (
              <Typography.Text type="secondary" style={{ fontSize: 13 }} ellipsis>
                {item.description}
              </Typography.Text>
            )}
          </div>
          {item.extra && <div style={{ flexShrink: 0 }}>{item.extra}</div>}
        </li>
      ))}
    </ul>
  );
}
