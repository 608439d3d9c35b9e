import { Alert, Button, Card, Descriptions, Empty, Grid, List, Select, Space, Table, Tag, Typography } from 'antd';
import type { PlanObjective } from '@swapwright/shared';
import { PLAN_OBJECTIVES, renderText, textParts } from '@swapwright/shared';
import { useState } from 'react';
import { CheckStatusTag } from '@/components/check-status-tag';
import { useUnits } from '@/hooks/use-units';
import type { Schemas } from '@/lib/api-types';
import { formatMoneyCents } from '@/lib/units';
import { useBuildPartsPlan } from '../api/build-parts-plan';
import { useProjectPartsPlans } from '../api/get-project-parts-plans';
import { useLockPartsPlan } from '../api/lock-parts-plan';

const OBJECTIVE_LABELS: Record<PlanObjective, string> = {
  'lowest-cost': 'Lowest total (parts + labor)',
  'least-fabrication': 'Fewest fabrication hours',
  'in-stock': 'Only what is on the shelf now',
};

type Pick = Schemas['PlanPartPickDto'];

/** A sentence the planner wrote, its figures in the person's unit system (shared's one formatting path). */
type Say = (text: string) => string;

/** Why a part is in the plan: what it resolves, which rule brought it in, and the cheaper parts not chosen. */
function PickReasons({ pick, money, say }: { pick: Pick; money: (cents: number) => string; say: Say }) {
  return (
    <div data-testid={`pick-${pick.sku}`}>
      {pick.resolves.length > 0 && <div>Resolves: {pick.resolves.map((r) => r.title).join(', ')}</div>}
      {pick.broughtInBy.map((why) => (
        <div key={why}>Brought in: {say(why)}</div>
      ))}
      {pick.rejected.length > 0 && (
        <Typography.Text type="secondary">
          Cheaper, not chosen: {pick.rejected.map((r) => `${r.sku} (${money(r.totalCents)}) ${say(r.reason)}`).join('; ')}
        </Typography.Text>
      )}
    </div>
  );
}

export type PartsPlanCardProps = { projectId: string; canBuild: boolean; currency?: string };

/** The project's parts plan: build a version, see each pick explained, what stays unresolved, lock it for a quote. */
export function PartsPlanCard({ projectId, canBuild, currency }: PartsPlanCardProps) {
  const plans = useProjectPartsPlans(projectId);
  const build = useBuildPartsPlan(projectId);
  const lock = useLockPartsPlan();
  const [objective, setObjective] = useState<PlanObjective>('lowest-cost');
  const latest = plans.data?.[0];
  const result = latest?.result;
  const money = (cents: number) => formatMoneyCents(cents, currency);
  const units = useUnits();
  const say: Say = (text) => renderText(textParts(text), units.system);
  const narrow = Grid.useBreakpoint().md === false;
  // The re-check fits the picks that carry a fit spec; what parts without one and operations resolve it cannot see.
  const unseen = new Set(
    [...(result?.picks.filter((p) => !p.fitSpecId) ?? []), ...(result?.operations ?? [])].flatMap((p) => p.resolves.map((r) => r.checkId)),
  );
  const stillShort = latest?.recheck.remaining.filter((r) => !unseen.has(r.checkId)) ?? [];

  return (
    <Card
      title="Parts plan"
      data-testid="parts-plan-card"
      extra={
        canBuild && (
          <Space wrap>
            <Select<PlanObjective>
              aria-label="Plan objective"
              value={objective}
              onChange={setObjective}
              style={{ minWidth: 240 }}
              options={PLAN_OBJECTIVES.map((value) => ({ value, label: OBJECTIVE_LABELS[value] }))}
            />
            <Button type="primary" loading={build.isPending} onClick={() => build.mutate({ objective })}>
              Build plan
            </Button>
          </Space>
        )
      }
    >
      {!latest || !result ? (
        <Empty description={canBuild ? 'No plan yet: build one from the latest fit check and the catalog.' : 'No parts plan yet.'} />
      ) : (
        <Space direction="vertical" style={{ width: '100%' }} size="middle">
          <Descriptions size="small" column={{ xs: 1, md: 4 }}>
            <Descriptions.Item label="Version">
              {latest.version} {latest.status === 'locked' ? <Tag color="blue">Locked for quote</Tag> : <Tag>Draft</Tag>}
            </Descriptions.Item>
            <Descriptions.Item label="Aim">{OBJECTIVE_LABELS[latest.objective as PlanObjective] ?? latest.objective}</Descriptions.Item>
            <Descriptions.Item label="Parts">{money(result.totals.partsCents)}</Descriptions.Item>
            <Descriptions.Item label="Labor">
              {money(result.totals.laborCents)} ({result.totals.laborHours} h)
            </Descriptions.Item>
            <Descriptions.Item label="Total">
              <strong data-testid="plan-total">{money(result.totals.totalCents)}</strong>
            </Descriptions.Item>
            <Descriptions.Item label="Fabrication">{result.totals.fabricationHours} h</Descriptions.Item>
          </Descriptions>
          {result.notes.map((note) => (
            <Alert key={note} type="info" showIcon title={say(note)} />
          ))}
          {narrow ? (
            <List<Pick>
              size="small"
              bordered
              dataSource={result.picks}
              rowKey="partId"
              renderItem={(pick) => (
                <List.Item>
                  <Space direction="vertical" size={2} style={{ width: '100%' }}>
                    <Typography.Text strong>
                      {pick.sku} · {pick.description}
                    </Typography.Text>
                    <Typography.Text>
                      {money(pick.priceCents)} · {pick.laborHours} h labor · {money(pick.totalCents)} with labor
                    </Typography.Text>
                    <PickReasons pick={pick} money={money} say={say} />
                  </Space>
                </List.Item>
              )}
            />
          ) : (
            <Table<Pick>
              size="small"
              rowKey="partId"
              pagination={false}
              dataSource={result.picks}
              columns={[
                { title: 'SKU', dataIndex: 'sku', onCell: () => ({ style: { whiteSpace: 'nowrap' } }) },
                { title: 'Part', dataIndex: 'description', width: 200 },
                { title: 'Price', dataIndex: 'priceCents', align: 'right', render: (v: number) => money(v) },
                { title: 'Labor', dataIndex: 'laborHours', align: 'right', onCell: () => ({ style: { whiteSpace: 'nowrap' } }), render: (v: number) => `${v} h` },
                // the cheaper parts not chosen are compared on this figure (part and its fitting labor)
                { title: 'With labor', dataIndex: 'totalCents', align: 'right', render: (v: number) => money(v) },
                { title: 'Why', key: 'why', render: (_, pick) => <PickReasons pick={pick} money={money} say={say} /> },
              ]}
            />
          )}
          {result.operations.length > 0 && (
            <List
              size="small"
              header="Fabrication and labor operations"
              dataSource={result.operations}
              renderItem={(op) => <List.Item>{say(op.explanation)}</List.Item>}
            />
          )}
          {result.kept.length > 0 && (
            <Typography.Text type="secondary">Kept as fitted: {result.kept.map((k) => k.name).join(', ')}.</Typography.Text>
          )}
          {result.unresolved.length > 0 && (
            <Alert
              type="warning"
              showIcon
              title="Not resolved by this plan"
              description={
                <ul style={{ margin: 0, paddingLeft: 18 }}>
                  {result.unresolved.map((u) => (
                    <li key={u.checkId}>
                      <strong>{u.title}</strong>: {say(u.reason)}
                      {u.catalogNeeds.length > 0 && `. The catalog would need: ${u.catalogNeeds.map(say).join('; ')}`}
                    </li>
                  ))}
                </ul>
              }
            />
          )}
          <div data-testid="plan-recheck">
            <Typography.Text type="secondary">
              Fit check run again with the chosen parts: {latest.recheck.resolved.length} {latest.recheck.resolved.length === 1 ? 'shortfall' : 'shortfalls'} cleared.{' '}
              {stillShort.length > 0 ? 'Still short with the chosen parts:' : 'Every other shortfall is answered by a part or an operation above.'}
            </Typography.Text>
            {stillShort.length > 0 && (
              <ul aria-label="Still short with the chosen parts" style={{ listStyle: 'none', padding: 0, margin: '6px 0', display: 'flex', flexDirection: 'column', gap: 4 }}>
                {stillShort.map((r) => (
                  <li key={r.checkId} data-testid={`still-short-${r.checkId}`}>
                    <CheckStatusTag status={r.status} /> {r.title}
                  </li>
                ))}
              </ul>
            )}
            {/* a paragraph of its own: two inline texts side by side ran together ("above.Fuel system") */}
            <Typography.Paragraph type="secondary" style={{ margin: '6px 0 0' }}>
              Fuel system, welding and lifting work carry risks: follow the cautions in the fit report and licensed practice.
            </Typography.Paragraph>
          </div>
          {canBuild && latest.status !== 'locked' && (
            <Button loading={lock.isPending} onClick={() => lock.mutate(latest.id)}>
              Lock version {latest.version} for a quote
            </Button>
          )}
        </Space>
      )}
    </Card>
  );
}
