import { formatMoney } from '@swapwright/shared';
import { Flex, Typography } from 'antd';
import type { ReactNode } from 'react';
import { palette } from '@/config/theme';
import type { QuoteLine } from '../types';
import { LineDescription } from './line-description';

export interface QuoteLineCardsProps {
  lines: QuoteLine[];
  currency: string;
  /** Shown before the description (the editor's part/labor tag). */
  lead?: (line: QuoteLine) => ReactNode;
  /** The line's commands (the editor's Edit and Remove), under its figures. */
  actions?: (line: QuoteLine) => ReactNode;
}

/** "2 × $289.95", "3.5 h × $135.00": how many at what price, as the line was priced. */
export function quoteLineQuantity(line: QuoteLine, currency: string): string {
  const many = line.kind === 'labor' ? `${(line.hours ?? 0).toFixed(1)} h` : String(line.quantity);
  return `${many} × ${formatMoney(line.unitPriceCents, currency)}`;
}

/**
 * A quote's lines stacked one under another for a phone: each line's name, how many at what price, its amount and its
 * commands, all readable without scrolling sideways (the wide screen shows the same figures as a table).
 */
export function QuoteLineCards({ lines, currency, lead, actions }: QuoteLineCardsProps) {
  return (
    <ul aria-label="Quote lines" style={{ listStyle: 'none', margin: 0, padding: 0 }}>
      {lines.map((line, i) => (
        <li key={line.key} data-testid={`quote-line-${line.key}`} style={{ padding: '10px 0', borderTop: i === 0 ? undefined : `1px solid ${palette.line}` }}>
          <Flex gap={8} align="baseline" wrap>
            {lead?.(line)}
            <Typography.Text strong style={{ flex: '1 1 12em', minWidth: 0 }}>
              <LineDescription line={line} />
            </Typography.Text>
          </Flex>
          {line.sku && (
            <Typography.Text type="secondary" style={{ display: 'block', fontSize: 13 }}>
              Part no. {line.sku}
            </Typography.Text>
          )}
          <Flex justify="space-between" gap={12} wrap style={{ marginTop: 4 }}>
            <span aria-label="Quantity and unit price">{quoteLineQuantity(line, currency)}</span>
            <Typography.Text strong aria-label="Line amount">
              {formatMoney(line.lineTotalCents, currency)}
            </Typography.Text>
          </Flex>
          {actions && <div style={{ marginTop: 4 }}>{actions(line)}</div>}
        </li>
      ))}
    </ul>
  );
}
