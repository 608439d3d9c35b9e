import { Alert, Button, Flex, Grid, Table, Tag, Typography } from 'antd';
import type { ColumnsType } from 'antd/es/table';
import { useState } from 'react';
import { useUnits } from '@/hooks/use-units';
import { formatDateTime } from '@/lib/dates';
import { useFitReportComparison } from '../api/compare-fit-reports';
import { useFitReports } from '../api/get-fit-reports';
import { formatFigure } from '../lib/figures';
import type { FitReportComparison, FitReportListItem, FitSummary } from '../types';
import { CheckStatusTag } from '@/components/check-status-tag';

export type ReportHistoryProps = {
  projectId: string;
  currentId?: string;
  onOpen: (id: string) => void;
};

const formatTime = formatDateTime;

export function SummaryTags({ summary }: { summary?: FitSummary }) {
  if (!summary) return <>—</>;
  return (
    <Flex gap={4} wrap>
      {(summary.fails ?? 0) > 0 && <Tag color="red">{summary.fails} blocked</Tag>}
      {(summary.tight ?? 0) > 0 && <Tag color="gold">{summary.tight} close</Tag>}
      {(summary.unknown ?? 0) > 0 && <Tag>{summary.unknown} need input</Tag>}
      <Tag color="green">{summary.ok ?? 0} clear</Tag>
    </Flex>
  );
}

type FindingDelta = FitReportComparison['changes'][number];

const changeWords: Record<FindingDelta['change'], string> = {
  improved: 'Better',
  worse: 'Worse',
  same: 'Same',
  added: 'New check',
  removed: 'Dropped',
};

/** What changed between an older report `a` and a newer report `b`, as the server compares them. */
function ReportComparison({ a, b }: { a: string; b: string }) {
  const units = useUnits();
  const narrow = Grid.useBreakpoint().sm === false;
  const comparison = useFitReportComparison(a, b);
  if (comparison.isError) return <Alert type="error" title="The two reports could not be compared." />;
  if (!comparison.data) return <Typography.Text type="secondary">Comparing the two reports…</Typography.Text>;
  const deltas = comparison.data.changes;
  const changed = deltas.filter((d) => d.change !== 'same');
  const resultTag = (d: FindingDelta) => <Tag color={d.change === 'improved' ? 'green' : d.change === 'worse' ? 'red' : undefined}>{changeWords[d.change]}</Tag>;
  const statusTag = (side: FindingDelta['before']) => (side ? <CheckStatusTag status={side.status} /> : '—');
  const columns: ColumnsType<FindingDelta> = [
    {
      title: 'Check',
      key: 'title',
      // On a phone the statuses and the result sit under the check's name, so its margin change stays in view.
      render: (_, d) =>
        narrow ? (
          <Flex vertical gap={4}>
            {d.title}
            <Flex gap={4} wrap align="center">
              {statusTag(d.before)} → {statusTag(d.after)} {resultTag(d)}
            </Flex>
          </Flex>
        ) : (
          d.title
        ),
    },
    { title: 'Older', key: 'before', responsive: ['sm'], render: (_, d) => statusTag(d.before) },
    { title: 'Newer', key: 'after', responsive: ['sm'], render: (_, d) => statusTag(d.after) },
    {
      title: 'Margin change',
      key: 'delta',
      align: 'right',
      onCell: () => ({ style: { whiteSpace: 'nowrap' } }),
      // In the check's own unit, as the report shows its margin: a clearance in in/mm, an angle in degrees, a pressure in psi/kPa.
      render: (_, d) => formatFigure(d.marginDelta, d.unit, units, { signed: true }),
    },
    { title: 'Result', key: 'change', responsive: ['sm'], render: (_, d) => resultTag(d) },
  ];
  return (
    <div data-testid="report-comparison">
      <Typography.Paragraph style={{ marginBottom: 8 }}>
        {changed.length === 0 ? 'The two reports agree on every check.' : `${changed.length} of ${deltas.length} checks changed between the two reports.`}
      </Typography.Paragraph>
      {changed.length > 0 && (
        <Table size="small" rowKey="checkId" columns={columns} dataSource={changed} pagination={false} aria-label="Changes between the two reports" />
      )}
    </div>
  );
}

/** Stored reports of the project, with a side-by-side comparison of any two. */
export function ReportHistory({ projectId, currentId, onOpen }: ReportHistoryProps) {
  const reports = useFitReports(projectId);
  const [picked, setPicked] = useState<string[]>([]);
  const [comparing, setComparing] = useState<[string, string] | null>(null);
  const units = useUnits();

  const columns: ColumnsType<FitReportListItem> = [
    {
      title: 'Run',
      key: 'createdAt',
      render: (_, r) => (
        <Flex gap={6} align="center">
          <Typography.Link onClick={() => onOpen(r.id)}>{formatTime(r.createdAt)}</Typography.Link>
          {r.id === currentId && <Tag color="blue">Showing</Tag>}
        </Flex>
      ),
    },
    { title: 'By', key: 'by', render: (_, r) => r.createdByName ?? '—', responsive: ['md'] },
    {
      title: 'Placement',
      key: 'placement',
      responsive: ['lg'],
      render: (_, r) =>
        r.placement ? `${units.formatLength(r.placement.setbackMm)} back · ${units.formatLength(r.placement.heightMm)} up · ${r.placement.tiltDeg.toFixed(1)}°` : '—',
    },
    { title: 'Result', key: 'summary', render: (_, r) => <SummaryTags summary={r.counts} /> },
  ];

  const items = reports.data?.items ?? [];
  // Picking and comparing mean something only once there are two reports to compare.
  const canCompare = items.length >= 2;
  return (
    <Flex vertical gap={12} data-testid="report-history">
      <Table<FitReportListItem>
        size="small"
        rowKey="id"
        loading={reports.isPending}
        columns={columns}
        dataSource={items}
        pagination={items.length > 10 ? { pageSize: 10 } : false}
        aria-label="Fit report history"
        locale={{ emptyText: 'No stored reports yet.' }}
        rowSelection={
          canCompare
            ? {
                selectedRowKeys: picked,
                onChange: (keys) => setPicked((keys as string[]).slice(-2)),
                getCheckboxProps: (r) => ({ 'aria-label': `Pick the report of ${formatTime(r.createdAt)} to compare` }),
                hideSelectAll: true,
              }
            : undefined
        }
      />
      {canCompare && (
        <Flex gap={8} align="center" wrap className="fit-control">
          <Button disabled={picked.length !== 2} onClick={() => setComparing([picked[0], picked[1]])}>
            Compare the two picked
          </Button>
          <Typography.Text type="secondary" style={{ fontSize: 13 }}>
            Tick two reports to see what changed between them.
          </Typography.Text>
        </Flex>
      )}
      {comparing && (() => {
        const byDate = [...comparing].sort((x, y) => {
          const dx = items.find((i) => i.id === x)?.createdAt ?? '';
          const dy = items.find((i) => i.id === y)?.createdAt ?? '';
          return dx.localeCompare(dy);
        });
        return <ReportComparison a={byDate[0]} b={byDate[1]} />;
      })()}
    </Flex>
  );
}
