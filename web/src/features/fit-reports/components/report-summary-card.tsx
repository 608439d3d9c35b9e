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

/** Which report is on screen, its counts, and what the server filled in or left out when it ran. */
export function ReportSummaryCard({ stored, shown, isPreview }: ReportSummaryCardProps) {
  const notes = stored.inputs.notes;
  return (
    <Card
      className="fit-report-summary"
      size="small"
      title={
        <Flex gap={8} align="center" wrap>
          <span>{isPreview ? 'Preview at the new placement' : 'Report'}</span>
          {isPreview ? <Tag color="gold">Preview, not saved</Tag> : <Tag>Stored {formatDateTime(stored.createdAt)}</Tag>}
          <Typography.Text type="secondary" style={{ fontSize: 12, fontWeight: 400 }}>
            rules v{shown.engineVersion}
          </Typography.Text>
        </Flex>
      }
      extra={<SummaryTags summary={shown.summary} />}
    >
      {notes.length > 0 && (
        <ul style={{ margin: 0, paddingLeft: 18 }}>
          {notes.map((n) => (
            <li key={n}>
              <Typography.Text type="secondary">{n}</Typography.Text>
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
