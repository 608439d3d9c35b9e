import { renderText, textParts } from '@swapwright/shared';
import { Card, Flex, Tag, Typography } from 'antd';
import type { ReactNode, Ref } from 'react';
import { belowHeader } from '@/config/theme';
import { useUnits } from '@/hooks/use-units';
import { formatDateTime } from '@/lib/dates';
import type { FitReport, StoredFitReport } from '../types';
import { SummaryTags } from './report-history';

export type ReportSummaryCardProps = {
  stored: StoredFitReport;
  /** The figures on screen: the stored report's, or the preview's at a tried placement. */
  shown: FitReport;
  isPreview: boolean;
  /** Shown with a preview: what to do with it (keep the placement, or go back to the stored one). */
  previewActions?: ReactNode;
  /** The card's element, for the page to scroll to (React 19 passes a ref as a prop). */
  ref?: Ref<HTMLDivElement>;
};

/**
 * Which report is on screen, its counts, and what the server filled in or left out when it ran. The date and the
 * counts sit in the card's body, where they wrap on a phone (in the card's head they were cut off at 390 px).
 */
export function ReportSummaryCard({ stored, shown, isPreview, previewActions, ref }: ReportSummaryCardProps) {
  const notes = stored.inputs.notes;
  const { system } = useUnits();
  return (
    <Card ref={ref} className="fit-report-summary" size="small" title={isPreview ? 'Preview at the new placement' : 'Report'} tabIndex={-1} style={belowHeader} data-testid="report-summary">
      <Flex vertical gap={8}>
        <Flex gap={8} align="center" wrap justify="space-between">
          {isPreview ? (
            <Tag color="gold">Preview, not saved</Tag>
          ) : (
            <Tag data-testid="report-stored-at" style={{ whiteSpace: 'normal' }}>
              Stored {formatDateTime(stored.createdAt)}
            </Tag>
          )}
          <SummaryTags summary={shown.summary} />
        </Flex>
        {isPreview && (
          <Flex gap={8} align="center" wrap data-testid="stored-counts">
            <Typography.Text type="secondary">The stored report had</Typography.Text>
            <SummaryTags summary={stored.report.summary} />
          </Flex>
        )}
        {isPreview && previewActions && (
          <Flex gap={8} wrap className="fit-control">
            {previewActions}
          </Flex>
        )}
        <Typography.Text type="secondary" style={{ fontSize: 12 }} data-testid="report-rule-set">
          Checked with rule set {shown.engineVersion}
        </Typography.Text>
        {notes.length > 0 && (
          <ul style={{ margin: 0, paddingLeft: 18 }}>
            {notes.map((n) => (
              <li key={n}>
                <Typography.Text type="secondary">{renderText(textParts(n), system)}</Typography.Text>
              </li>
            ))}
          </ul>
        )}
      </Flex>
    </Card>
  );
}
