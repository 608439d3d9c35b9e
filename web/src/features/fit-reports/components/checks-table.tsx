import { renderFindingText, type CheckGroup, type Finding } from '@swapwright/shared';
import { Flex, Table, Typography } from 'antd';
import type { ColumnsType } from 'antd/es/table';
import type { HTMLAttributes } from 'react';
import { useUnits } from '@/hooks/use-units';
import { formatFigure, formatMargin, formatRequirement } from '../lib/figures';
import { matchResult, missingInputLabel } from '../lib/labels';
import { groupLabels, groupOrder, worstStatus } from '../lib/status';
import { CheckStatusTag } from '@/components/check-status-tag';

export type ChecksTableProps = { findings: readonly Finding[] };

/** Every check of the report, grouped by system, each group under its own heading. */
export function ChecksTable({ findings }: ChecksTableProps) {
  const units = useUnits();
  const groups = new Map<CheckGroup, Finding[]>();
  for (const f of findings) groups.set(f.group, [...(groups.get(f.group) ?? []), f]);
  const ordered = [...groups.keys()].sort((a, b) => groupOrder.indexOf(a) - groupOrder.indexOf(b));

  const columns: ColumnsType<Finding> = [
    { title: 'Status', key: 'status', width: 110, render: (_, f) => <CheckStatusTag status={f.status} /> },
    {
      title: 'Check',
      key: 'title',
      render: (_, f) => (
        <>
          <Typography.Text strong>{f.title}</Typography.Text>
          <Typography.Paragraph type="secondary" style={{ margin: 0, fontSize: 13 }}>
            {f.status === 'unknown' && f.missing.length ? `Missing: ${f.missing.map(missingInputLabel).join(', ')}` : renderFindingText(f, units.system)}
          </Typography.Paragraph>
          {/* On a phone the figure columns give way to this line (see global.css), so the sentence keeps its width. */}
          {f.limit !== 'match' && f.measured !== null && (
            <Typography.Text className="fit-check-figures-phone" style={{ fontSize: 13 }}>
              Found {formatFigure(f.measured, f.unit, units)} · margin {formatMargin(f, units)}
            </Typography.Text>
          )}
        </>
      ),
    },
    {
      title: 'Found',
      key: 'measured',
      width: 120,
      align: 'right',
      render: (_, f) => (f.limit === 'match' ? matchResult(f) : formatFigure(f.measured, f.unit, units)),
      responsive: ['sm'],
    },
    { title: 'Needs', key: 'required', width: 140, align: 'right', render: (_, f) => (f.limit === 'match' ? '—' : formatRequirement(f, units)), responsive: ['md'] },
    { title: 'Margin', key: 'margin', width: 110, align: 'right', render: (_, f) => formatMargin(f, units), responsive: ['sm'] },
    {
      title: 'Limit based on',
      key: 'source',
      width: 220,
      responsive: ['xl'],
      render: (_, f) => (
        <Typography.Text type="secondary" style={{ fontSize: 12 }}>
          {f.thresholdSource || '—'}
        </Typography.Text>
      ),
    },
  ];

  return (
    <Flex vertical gap={20} className="fit-checks">
      {ordered.map((group) => {
        const rows = groups.get(group) ?? [];
        return (
          <section key={group} aria-labelledby={`fit-group-${group}`}>
            <Flex align="center" gap={10} style={{ marginBottom: 6 }}>
              <Typography.Title level={5} id={`fit-group-${group}`} style={{ margin: 0 }}>
                {groupLabels[group] ?? group}
              </Typography.Title>
              <CheckStatusTag status={worstStatus(rows)} />
            </Flex>
            <Table<Finding>
              size="small"
              rowKey="checkId"
              columns={columns}
              dataSource={rows}
              pagination={false}
              aria-label={`${groupLabels[group] ?? group} checks`}
              onRow={(f) => ({ 'data-testid': `check-${f.checkId}`, 'data-status': f.status }) as HTMLAttributes<HTMLElement>}
            />
          </section>
        );
      })}
    </Flex>
  );
}
