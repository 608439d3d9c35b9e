import { counterLineSetAside, counterLineShortBy, counterLineStateWords, type CounterStatus } from '@swapwright/shared';
import { Button, Card, Empty, Flex, Grid, Select, Space, Table, Tag, Typography } from 'antd';
import { useSearchParams } from 'react-router-dom';
import { BinCode } from '@/components/bin-code';
import { palette } from '@/config/theme';
import { formatMoneyCents } from '@/lib/units';
import { downloadPickList } from '../api/download-pick-list';
import { type CounterLine, useCounterLines } from '../api/get-counter-lines';
import { type PlanSummary, useRecentPartsPlans } from '../api/get-recent-parts-plans';
import { useIssueCounterLine } from '../api/issue-counter-line';
import { useIssuePartsPlan } from '../api/issue-parts-plan';
import { useMarkCounterLine } from '../api/mark-counter-line';
import { useReceiveCounterLine } from '../api/receive-counter-line';
import { useReleaseCounterLine } from '../api/release-counter-line';
import { useReserveCounterLine } from '../api/reserve-counter-line';
import { useReturnCounterLine } from '../api/return-counter-line';

const STATUS_COLORS: Record<CounterStatus, string> = { open: 'default', reserved: 'green', 'to-order': 'orange', ordered: 'gold', received: 'blue', issued: 'purple' };

export type CounterBoardProps = {
  /** The shop's currency, for the plan's total. */
  currency?: string;
};

/** The counter's job board: each project's latest plan as a matched parts list with stock and bins, reservations and a printable pick list. */
/** A job in the counter's list: the project, its customer and the plan's version (two trucks of one model read apart). */
function jobOption(plan: PlanSummary) {
  const customer = plan.customerName ? ` · ${plan.customerName}` : '';
  return { value: plan.id, label: `${plan.projectTitle}${customer} · plan v${plan.version}` };
}

export function CounterBoard({ currency }: CounterBoardProps) {
  const plans = useRecentPartsPlans();
  // The job chosen is in the address (?plan=), so a reload or a link from its work order opens the same list.
  const [params, setParams] = useSearchParams();
  const chosen = params.get('plan') ?? undefined;
  const setChosen = (id: string) =>
    setParams(
      (current) => {
        current.set('plan', id);
        return current;
      },
      { replace: true },
    );
  // Jobs still being worked first; a done job's list stays to look up, under its own heading.
  const open = (plans.data ?? []).filter((p) => p.projectStatus !== 'done');
  const done = (plans.data ?? []).filter((p) => p.projectStatus === 'done');
  const planId = chosen ?? open[0]?.id ?? done[0]?.id;
  const plan = plans.data?.find((p) => p.id === planId);
  const lines = useCounterLines(planId);
  const reserve = useReserveCounterLine();
  const release = useReleaseCounterLine();
  const mark = useMarkCounterLine();
  const receive = useReceiveCounterLine();
  const issue = useIssueCounterLine();
  const issueAll = useIssuePartsPlan();
  const giveBack = useReturnCounterLine();
  const setAsideCount = (lines.data ?? []).filter(counterLineSetAside).length;
  // Below antd's md (768 px) each line stacks (part, figures, bin, state, commands), so nothing hides past a phone's edge.
  const narrow = Grid.useBreakpoint().md === false;

  if (plans.data && plans.data.length === 0) {
    return (
      <Card>
        <Empty description="No parts plans yet. Once an estimator builds a plan for a project, its parts list lands here." />
      </Card>
    );
  }

  const binOf = (line: CounterLine) => {
    const from = line.stock.find((s) => s.id === line.stockId) ?? line.stock[0];
    // The store may wrap; the bin code never breaks inside itself (at its hyphens), on screen or on the printed pick list.
    return from ? (
      <>
        {from.location} · <BinCode code={from.bin || 'no bin'} />
      </>
    ) : (
      'no location'
    );
  };
  // The words come from shared, as in the exported pick list; a short line (the shelf cannot cover it) is red.
  const statusTag = (line: CounterLine) => (
    <Tag color={counterLineShortBy(line) > 0 ? 'red' : STATUS_COLORS[line.status]} data-testid="line-status">
      {counterLineStateWords(line)}
    </Tag>
  );
  const whyNoReserve = (line: CounterLine) =>
    line.available < line.quantity && ['open', 'to-order', 'ordered'].includes(line.status) ? (
      <Typography.Text type="secondary" style={{ fontSize: 13 }} data-testid="reserve-reason">
        {line.available <= 0 ? 'None free to set aside' : `Only ${line.available} free of ${line.quantity}`}
        {line.status === 'open' ? ': mark it To order.' : '.'}
      </Typography.Text>
    ) : null;
  const marking = (line: CounterLine, status: CounterStatus) => mark.isPending && mark.variables?.lineId === line.id && mark.variables.status === status;
  const lineActions = (line: CounterLine) => (
    <Space wrap>
      {['open', 'to-order', 'ordered'].includes(line.status) && (
        <Button size="small" type="primary" disabled={line.available < line.quantity} loading={reserve.isPending && reserve.variables === line.id} onClick={() => reserve.mutate(line.id)}>
          Reserve
        </Button>
      )}
      {counterLineSetAside(line) && (
        <Button size="small" type="primary" loading={issue.isPending && issue.variables === line.id} onClick={() => issue.mutate(line.id)}>
          Issue to job
        </Button>
      )}
      {counterLineSetAside(line) && (
        <Button size="small" loading={release.isPending && release.variables === line.id} onClick={() => release.mutate(line.id)}>
          Release
        </Button>
      )}
      {line.status === 'issued' && (
        <Button size="small" loading={giveBack.isPending && giveBack.variables === line.id} onClick={() => giveBack.mutate(line.id)}>
          Return to shelf
        </Button>
      )}
      {line.status === 'open' && (
        <Button size="small" loading={marking(line, 'to-order')} onClick={() => mark.mutate({ lineId: line.id, status: 'to-order' })}>
          To order
        </Button>
      )}
      {(line.status === 'open' || line.status === 'to-order') && (
        <Button size="small" loading={marking(line, 'ordered')} onClick={() => mark.mutate({ lineId: line.id, status: 'ordered' })}>
          Ordered
        </Button>
      )}
      {(line.status === 'ordered' || line.status === 'to-order') && (
        <Button size="small" loading={receive.isPending && receive.variables?.lineId === line.id} onClick={() => receive.mutate({ lineId: line.id, location: line.stock[0]?.location ?? 'Main store' })}>
          Received
        </Button>
      )}
      {whyNoReserve(line)}
      {line.status === 'issued' && (
        <Typography.Text type="secondary" style={{ fontSize: 13 }} data-testid="issued-note">
          Off the shelf{line.issuedAt ? ` since ${new Date(line.issuedAt).toLocaleDateString(undefined, { day: 'numeric', month: 'short' })}` : ''}. Came back unused? Return it to the shelf.
        </Typography.Text>
      )}
    </Space>
  );

  return (
    <Card className="pick-list">
      <Flex wrap gap={8} align="center" justify="space-between" style={{ marginBottom: 16 }}>
        <Flex wrap gap={8} align="center" style={{ flex: '1 1 320px', minWidth: 0 }}>
          <Typography.Text strong>Parts list for</Typography.Text>
          <Select
            aria-label="Job"
            className="no-print"
            style={{ flex: '1 1 260px', minWidth: 0, maxWidth: 440 }}
            loading={plans.isLoading}
            value={planId}
            onChange={setChosen}
            options={[
              ...(open.length > 0 ? [{ label: 'Jobs in progress', options: open.map(jobOption) }] : []),
              ...(done.length > 0 ? [{ label: 'Built (done)', options: done.map(jobOption) }] : []),
            ]}
          />
          <Typography.Text strong className="print-only">
            {plan ? `${plan.projectTitle} · plan v${plan.version}` : ''}
          </Typography.Text>
        </Flex>
        {planId && (
          <Space className="no-print" wrap>
            {setAsideCount > 0 && (
              <Button type="primary" loading={issueAll.isPending} onClick={() => issueAll.mutate(planId)}>
                Issue all set aside ({setAsideCount})
              </Button>
            )}
            <Button onClick={() => window.print()}>Print pick list</Button>
            <Button onClick={() => void downloadPickList(planId, plan ? `${plan.projectTitle} plan v${plan.version}` : undefined)}>Export CSV</Button>
          </Space>
        )}
      </Flex>
      {narrow ? (
        <ul aria-label="Parts list" style={{ listStyle: 'none', margin: 0, padding: 0 }}>
          {(lines.data ?? []).map((line, i) => (
            <li key={line.id} data-testid={`counter-line-${line.sku}`} style={{ padding: '10px 0', borderTop: i === 0 ? undefined : `1px solid ${palette.line}` }}>
              <Flex justify="space-between" align="baseline" gap={8}>
                <Typography.Text strong style={{ minWidth: 0 }}>
                  {line.description}
                </Typography.Text>
                {statusTag(line)}
              </Flex>
              <Typography.Text type="secondary" style={{ display: 'block', fontSize: 13 }}>
                {line.sku} · {binOf(line)}
              </Typography.Text>
              <div aria-label="Quantities">
                Need {line.quantity} · {line.onHand} on hand · {line.available} free
              </div>
              <div className="no-print" style={{ marginTop: 6 }}>
                {lineActions(line)}
              </div>
            </li>
          ))}
        </ul>
      ) : (
        <Table<CounterLine>
          size="small"
          rowKey="id"
          loading={lines.isLoading}
          pagination={false}
          dataSource={lines.data ?? []}
          scroll={{ x: true }}
          columns={[
            { title: 'SKU', dataIndex: 'sku', onCell: () => ({ style: { whiteSpace: 'nowrap' } }) },
            { title: 'Part', dataIndex: 'description' },
            { title: 'Qty', dataIndex: 'quantity', align: 'right' },
            { title: 'On hand', dataIndex: 'onHand', align: 'right' },
            { title: 'Free', dataIndex: 'available', align: 'right' },
            { title: 'Location and bin', key: 'bin', render: (_, line) => binOf(line) },
            {
              title: 'State',
              key: 'status',
              render: (_, line) => statusTag(line),
            },
            {
              title: 'Action',
              key: 'action',
              className: 'no-print',
              render: (_, line) => lineActions(line),
            },
          ]}
        />
      )}
      {plan && (
        <Typography.Paragraph type="secondary" style={{ marginTop: 12 }}>
          Plan total {formatMoneyCents(plan.totalCents, currency)} (parts and labor). Check each part against the plan before it leaves the counter.
        </Typography.Paragraph>
      )}
    </Card>
  );
}
