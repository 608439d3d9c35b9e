import { customerSourceWords, renderFindingText, renderText, textParts, type CheckGroup, type Finding } from '@swapwright/shared';
import { Collapse, Flex, Grid, Table, Typography } from 'antd';
import type { ColumnsType } from 'antd/es/table';
import type { HTMLAttributes } from 'react';
import { useUnits } from '@/hooks/use-units';
import { formatFigure, formatMargin, formatRequirement } from '../lib/figures';
import { matchResult, missingInputLabel } from '../lib/labels';
import { compareWorstFirst, groupLabels, groupOrder, statusSeverity, worstStatus } from '../lib/status';
import { CheckStatusTag } from '@/components/check-status-tag';
import './fit-print.css';

export type ChecksTableProps = { findings: readonly Finding[] };

/**
 * Every check of the report, grouped by system, each group under its own heading. On a phone the checks that do not
 * pass come first (worst group first) and the passing ones wait behind one expandable section; the printed report
 * opens that section, so paper still carries every check.
 */
export function ChecksTable({ findings }: ChecksTableProps) {
  const narrow = Grid.useBreakpoint().md === false;
  if (!narrow) return <GroupedChecks findings={findings} idPrefix="fit-group" />;
  const passing = findings.filter((f) => f.status === 'ok');
  const open = findings.filter((f) => f.status !== 'ok');
  return (
    <Flex vertical gap={16}>
      {open.length > 0 ? (
        <GroupedChecks findings={open} idPrefix="fit-group" worstFirst />
      ) : (
        <Typography.Text data-testid="every-check-passes">Every check that could run passes.</Typography.Text>
      )}
      {passing.length > 0 && (
        <Collapse
          className="fit-passing-checks"
          data-testid="passing-checks"
          items={[
            {
              key: 'passing',
              label: passing.length === 1 ? 'The 1 check that passes' : `All ${passing.length} checks that pass`,
              forceRender: true,
              children: <GroupedChecks findings={passing} idPrefix="fit-passing-group" />,
            },
          ]}
        />
      )}
    </Flex>
  );
}

type GroupedChecksProps = ChecksTableProps & {
  /** Prefix of the group headings' ids (two lists on one page keep their ids apart). */
  idPrefix: string;
  /** Groups with the worst status first and, inside each, the worst check first. */
  worstFirst?: boolean;
};

function GroupedChecks({ findings, idPrefix, worstFirst = false }: GroupedChecksProps) {
  const units = useUnits();
  // what the limit rests on, in customer words ("Shop rule of thumb, not a published standard: …") and the person's units
  const sourceText = (f: Finding) => renderText(textParts(customerSourceWords(f.thresholdSource)), units.system);
  const groups = new Map<CheckGroup, Finding[]>();
  for (const f of findings) groups.set(f.group, [...(groups.get(f.group) ?? []), f]);
  if (worstFirst) for (const [group, rows] of groups) groups.set(group, [...rows].sort(compareWorstFirst));
  const severity = (group: CheckGroup) => (worstFirst ? statusSeverity[worstStatus(groups.get(group) ?? [])] : 0);
  const ordered = [...groups.keys()].sort((a, b) => severity(b) - severity(a) || groupOrder.indexOf(a) - groupOrder.indexOf(b));

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
          {/* On paper the limit's basis prints under the sentence: the page is narrower than the column needs. */}
          {f.thresholdSource && (
            <Typography.Text className="fit-check-source-print" type="secondary" style={{ fontSize: 12 }}>
              Limit based on: {sourceText(f)}
            </Typography.Text>
          )}
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
          {f.thresholdSource ? sourceText(f) : '—'}
        </Typography.Text>
      ),
    },
  ];

  return (
    <Flex vertical gap={20} className="fit-checks">
      {ordered.map((group) => {
        const rows = groups.get(group) ?? [];
        return (
          <section key={group} aria-labelledby={`${idPrefix}-${group}`}>
            <Flex align="center" gap={10} style={{ marginBottom: 6 }}>
              <Typography.Title level={5} id={`${idPrefix}-${group}`} style={{ margin: 0 }}>
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
