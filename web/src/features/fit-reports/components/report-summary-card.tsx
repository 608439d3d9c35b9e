import { Card, Flex, Tag, Typography } from 'antd';
import { formatDateTime } from '@/lib/dates';
import type { FitReport, StoredFitReport } from '../types';
import { SummaryTags } from './report-history';

export type ReportSummaryCardProps = {
  stored: StoredFitReport;
  /** The figures on screen: the stored report's, or the preview's at a tried placement. */
  shown: FitReport;
  isPreview: boolean;
};

/**
 * Which report is on screen, its counts, and what the server filled in or left out when it ran. The date and the
 * counts sit in the card's body, where they wrap on a phone (in the card's head they were cut off at 390 px).
 */
export function ReportSummaryCard({ stored, shown, isPreview }: ReportSummaryCardProps) {
  const notes = stored.inputs.notes;
  return (
    <Card className="fit-report-summary" size="small" title={isPreview ? 'Preview at the new placement' : 'Report'}>
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
        <Typography.Text type="secondary" style={{ fontSize: 12 }} data-testid="report-rule-set">
          Checked with rule set {shown.engineVersion}
        </Typography.Text>
        {notes.length > 0 && (
          <ul style={{ margin: 0, paddingLeft: 18 }}>
            {notes.map((n) => (
              <li key={n}>
                <Typography.Text type="secondary">{n}</Typography.Text>
              </li>
            ))}
          </ul>
        )}
      </Flex>
    </Card>
  );
}
