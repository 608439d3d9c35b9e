import { Alert, Card, Descriptions, Grid, List, Space, Table, Tag, Typography } from 'antd';
import { renderText, textParts } from '@swapwright/shared';
import { useUnits } from '@/hooks/use-units';
import { formatMoneyCents } from '@/lib/units';
import { useCustomerPartsPlans, type CustomerPartsPlan } from '../api/get-customer-parts-plans';

type PlanPart = CustomerPartsPlan['parts'][number];

/** The version the customer is shown: the newest locked one (what a quote is drawn from), else the newest. */
export function planToShow(plans: readonly CustomerPartsPlan[] | undefined): CustomerPartsPlan | undefined {
  return plans?.find((plan) => plan.status === 'locked') ?? plans?.[0];
}

export type CustomerPartsPlanCardProps = { projectId: string; currency?: string };

/**
 * The customer's read-only look at the shop's parts plan for their project: the parts at the plan's prices, the
 * labor with its hours, the totals, what the plan leaves open and its notes. Nothing at all while there is no plan.
 */
export function CustomerPartsPlanCard({ projectId, currency }: CustomerPartsPlanCardProps) {
  const plans = useCustomerPartsPlans(projectId);
  const units = useUnits();
  // Below antd's md (768 px) the parts stack, so nothing hides past the right edge of a phone.
  const narrow = Grid.useBreakpoint().md === false;
  const plan = planToShow(plans.data);
  if (!plan) return null;
  const money = (cents: number) => formatMoneyCents(cents, currency);
  const say = (text: string) => renderText(textParts(text), units.system);
  const { totals } = plan;

  return (
    <Card title="Parts plan" data-testid="customer-parts-plan" style={{ marginTop: 16 }}>
      <Space direction="vertical" style={{ width: '100%' }} size="middle">
        <Typography.Text type="secondary">
          Version {plan.version}{' '}
          {plan.status === 'locked' ? (
            <Tag color="blue">Settled for your quote</Tag>
          ) : (
            <Tag>Draft: the shop may still change it</Tag>
          )}
        </Typography.Text>
        <Descriptions size="small" column={{ xs: 1, md: 3 }}>
          <Descriptions.Item label="Parts">{money(totals.partsCents)}</Descriptions.Item>
          <Descriptions.Item label="Labor">
            {money(totals.laborCents)} ({totals.laborHours} h)
          </Descriptions.Item>
          <Descriptions.Item label="Plan total">
            <strong data-testid="customer-plan-total">{money(totals.totalCents)}</strong>
          </Descriptions.Item>
        </Descriptions>
        {plan.notes.map((note) => (
          <Alert key={note} type="info" showIcon title={say(note)} />
        ))}
        {plan.parts.length > 0 &&
          (narrow ? (
            <List<PlanPart>
              size="small"
              bordered
              header="Parts"
              dataSource={plan.parts}
              rowKey="sku"
              renderItem={(part) => (
                <List.Item data-testid={`plan-part-${part.sku}`}>
                  <Space direction="vertical" size={2} style={{ width: '100%', minWidth: 0 }}>
                    <Typography.Text strong>{part.description}</Typography.Text>
                    <Typography.Text type="secondary">
                      {part.sku} · qty {part.quantity}
                    </Typography.Text>
                    <Typography.Text>
                      {money(part.priceCents)} · {part.laborHours} h to fit
                    </Typography.Text>
                    {part.resolves.length > 0 && <Typography.Text type="secondary">For: {part.resolves.map(say).join(', ')}</Typography.Text>}
                  </Space>
                </List.Item>
              )}
            />
          ) : (
            <Table<PlanPart>
              size="small"
              rowKey="sku"
              pagination={false}
              scroll={{ x: 'max-content' }}
              dataSource={plan.parts}
              columns={[
                { title: 'Part', dataIndex: 'description' },
                { title: 'Part number', dataIndex: 'sku', onCell: () => ({ style: { whiteSpace: 'nowrap' } }) },
                { title: 'Qty', dataIndex: 'quantity', align: 'right' },
                { title: 'Price', dataIndex: 'priceCents', align: 'right', render: (v: number) => money(v) },
                { title: 'Hours to fit', dataIndex: 'laborHours', align: 'right', render: (v: number) => `${v} h` },
                { title: 'For', key: 'for', render: (_, part) => part.resolves.map(say).join(', ') },
              ]}
            />
          ))}
        {plan.operations.length > 0 && (
          <List
            size="small"
            bordered
            header="Fabrication and labor"
            dataSource={plan.operations}
            renderItem={(op) => (
              <List.Item data-testid="plan-operation">
                <Space direction="vertical" size={2} style={{ width: '100%', minWidth: 0 }}>
                  <Typography.Text>
                    {say(op.operation)} · {op.laborHours} h
                  </Typography.Text>
                  {op.resolves.length > 0 && <Typography.Text type="secondary">For: {op.resolves.map(say).join(', ')}</Typography.Text>}
                </Space>
              </List.Item>
            )}
          />
        )}
        {plan.unresolved.length > 0 && (
          <Alert
            type="warning"
            showIcon
            title="Not answered by this plan yet"
            description={
              <ul style={{ margin: 0, paddingLeft: 18 }}>
                {plan.unresolved.map((u) => (
                  <li key={u.checkId}>
                    <strong>{u.title}</strong>: {say(u.message)}
                  </li>
                ))}
              </ul>
            }
          />
        )}
        <Typography.Text type="secondary">
          These are the plan&apos;s prices; the quote you approve adds shop supplies and tax where they apply.
        </Typography.Text>
        {/* the page's footer carries the full planning-aid caution; this names the risky work of a plan */}
        <Typography.Paragraph type="secondary" style={{ margin: 0 }} data-testid="plan-caution">
          Fuel-system, welding and lifting work carry risks: the shop does it under the cautions in the fit report, local
          codes and licensed practice.
        </Typography.Paragraph>
      </Space>
    </Card>
  );
}
