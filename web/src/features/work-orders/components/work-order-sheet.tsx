import { COUNTER_STATUS_LABELS, renderText, textParts } from '@swapwright/shared';
import { Alert, App, Button, Card, Flex, Popconfirm, Progress, Space, Tag, Typography } from 'antd';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useUnits } from '@/hooks/use-units';
import { getErrorMessage } from '@/lib/api-error';
import { formatDateTime } from '@/lib/dates';
import { useFinishWorkOrder } from '../api/finish-work-order';
import { useStartWorkOrder } from '../api/start-work-order';
import type { WorkOrder } from '../types';
import { CheckRecorder } from './check-recorder';
import { WorkOrderStateTag } from './work-order-state-tag';
import './work-order.css';

const HAZARD_WORDS = { lifting: 'Lifting', support: 'Vehicle support', fuel: 'Fuel', welding: 'Welding', steering: 'Steering', brakes: 'Brakes' } as const;

export interface WorkOrderSheetProps {
  order: WorkOrder;
  /** Start, record checks and finish: the fabricator, the estimator and the owner. */
  canWork: boolean;
  projectPath: string;
}

/** The work order as the bay uses it: cautions first, then each operation in build order with its torques and checks. */
export function WorkOrderSheet({ order, canWork, projectPath }: WorkOrderSheetProps) {
  const start = useStartWorkOrder();
  const finish = useFinishWorkOrder();
  const { message } = App.useApp();
  const { system } = useUnits();
  // The plan's words (an operation, a remedy's line, a part's note) keep the engine's figures; they read in the person's system.
  const say = (text: string) => renderText(textParts(text), system);
  // A part's name keeps its maker's figures ("Heavy mount kit, 90 mm"); only the plan's paired lengths convert.
  const sayName = (text: string) => renderText(textParts(text, { pairedLengthsOnly: true }), system);
  const inBay = order.state === 'in-the-bay';
  const { progress } = order;
  return (
    <div className="work-order-page">
      <Flex justify="space-between" align="flex-start" gap={12} wrap style={{ marginBottom: 16 }}>
        <div>
          <Typography.Title level={2} style={{ margin: 0 }}>
            Work order {order.label} <WorkOrderStateTag state={order.state} />
          </Typography.Title>
          <Typography.Text>
            <Link to={projectPath}>{order.projectTitle}</Link>
            {order.customerName ? ` · ${order.customerName}` : ''}
          </Typography.Text>
          <Typography.Paragraph type="secondary" style={{ margin: 0 }}>
            {order.vehicleDescription}
          </Typography.Paragraph>
          <Typography.Text type="secondary" style={{ fontSize: 13 }}>
            From quote {order.quoteLabel} revision {order.quoteRevision}
            {order.partsPlanVersion !== null ? ` · parts plan v${order.partsPlanVersion}` : ''} · opened {formatDateTime(order.createdAt)}
            {order.startedAt ? ` · in the bay since ${formatDateTime(order.startedAt)}` : ''}
            {order.finishedAt ? ` · finished ${formatDateTime(order.finishedAt)}` : ''}
          </Typography.Text>
          {order.partsAtCounter && order.state !== 'finished' && <PartsAtCounter parts={order.partsAtCounter} />}
        </div>
        <Space wrap className="no-print">
          {canWork && order.state === 'ready' && (
            <StartInBayButton order={order} loading={start.isPending} onStart={() => start.mutate(order.id, { onError: (error) => void message.error(getErrorMessage(error)) })} />
          )}
          {canWork && inBay && (
            <Button
              type="primary"
              loading={finish.isPending}
              disabled={progress.passed < progress.total}
              onClick={() => finish.mutate(order.id, { onError: (error) => void message.error(getErrorMessage(error)) })}
            >
              Finish the job
            </Button>
          )}
          <Button onClick={() => window.print()}>Print</Button>
        </Space>
      </Flex>

      <Alert
        type="warning"
        showIcon
        style={{ marginBottom: 16 }}
        title="Before you start"
        description={
          <>
            <ul style={{ margin: '4px 0', paddingLeft: 18 }} data-testid="work-order-cautions">
              {order.cautions.map((caution) => (
                <li key={caution.hazard}>{caution.caution}</li>
              ))}
            </ul>
            <Typography.Text type="secondary">{order.deference}</Typography.Text>
          </>
        }
      />

      <Card size="small" style={{ marginBottom: 16 }}>
        <Flex align="center" gap={16} wrap>
          <Progress
            type="circle"
            size={56}
            percent={progress.total ? Math.round((progress.passed / progress.total) * 100) : 100}
            status={progress.failed ? 'exception' : undefined}
          />
          <Typography.Text data-testid="work-order-progress">
            {progress.passed} of {progress.total} checks passed
            {progress.failed ? ` · ${progress.failed} failed` : ''}
            {progress.open ? ` · ${progress.open} open` : ''}
          </Typography.Text>
          {!inBay && order.state === 'ready' && canWork && <Typography.Text type="secondary">Start the work order to record checks.</Typography.Text>}
        </Flex>
      </Card>

      <ol style={{ listStyle: 'none', padding: 0, margin: 0 }} aria-label="Operations in build order">
        {order.steps.map((step, index) => (
          <li key={step.key} className="work-order-step">
            <Card
              size="small"
              data-testid={`step-${step.key}`}
              title={
                <span style={{ whiteSpace: 'normal' }}>
                  {index + 1}. {say(step.name)}
                </span>
              }
              extra={step.hours ? <Typography.Text type="secondary">{step.hours.toFixed(1)} h</Typography.Text> : null}
            >
              {step.hazards.length > 0 && (
                <Space wrap size={4} style={{ marginBottom: 8 }}>
                  {step.hazards.map((hazard) => (
                    <Tag key={hazard} color="orange">
                      {HAZARD_WORDS[hazard]}
                    </Tag>
                  ))}
                </Space>
              )}
              {step.parts.length > 0 && (
                <Typography.Paragraph style={{ marginBottom: 8 }}>
                  <Typography.Text type="secondary">Parts: </Typography.Text>
                  {step.parts.map((part) => `${part.quantity} × ${part.sku ? `${part.sku} ` : ''}${sayName(part.description)}`).join('; ')}
                </Typography.Paragraph>
              )}
              {step.torque.length > 0 && (
                <>
                  <Typography.Text strong style={{ display: 'block' }}>
                    Tightening
                  </Typography.Text>
                  <ul className="work-order-torque" data-testid="torque-specs">
                    {step.torque.map((spec) => (
                      <li key={`${spec.partSku ?? 'op'}-${spec.fastener}`}>
                        <span>
                          {spec.fastener}
                          <Typography.Text type="secondary">{spec.partSku ? ` (from ${spec.partSku})` : ' (shop figure)'}</Typography.Text>
                        </span>
                        <span className="work-order-torque__figures">
                          {spec.lbfFt.toFixed(1)} lbf·ft · {spec.newtonMetres.toFixed(1)} N·m
                        </span>
                        {spec.sequence && <span className="work-order-torque__sequence">{spec.sequence}</span>}
                      </li>
                    ))}
                  </ul>
                </>
              )}
              {step.instructions.length > 0 && (
                <ul style={{ margin: '8px 0', paddingLeft: 18 }}>
                  {step.instructions.map((text) => (
                    <li key={text}>{say(text)}</li>
                  ))}
                </ul>
              )}
              {step.checks.length > 0 && (
                <div style={{ marginTop: 8 }}>
                  <Typography.Text strong style={{ display: 'block' }}>
                    Checks to record
                  </Typography.Text>
                  {step.checks.map((check) => (
                    <CheckRecorder key={check.key} workOrderId={order.id} check={check} canRecord={canWork && inBay} />
                  ))}
                </div>
              )}
            </Card>
          </li>
        ))}
      </ol>
    </div>
  );
}

type PartsAtCounterState = NonNullable<WorkOrder['partsAtCounter']>;

/** "Parts: 6 of 7 counter lines with the job", and what the rest wait for, with the way to the counter. */
function PartsAtCounter({ parts }: { parts: PartsAtCounterState }) {
  const allThere = parts.waiting.length === 0;
  return (
    <Typography.Paragraph style={{ margin: '4px 0 0' }} data-testid="parts-at-counter">
      <Tag color={allThere ? 'green' : 'gold'}>
        Parts: {parts.withTheJob} of {parts.total} counter {parts.total === 1 ? 'line' : 'lines'} with the job
      </Tag>
      {!allThere && (
        <Typography.Text type="secondary" style={{ fontSize: 13 }}>
          waiting: {waitingWords(parts)} · <Link to={`${paths.partsCounter}?plan=${encodeURIComponent(parts.planId)}`}>Parts counter</Link>
        </Typography.Text>
      )}
    </Typography.Paragraph>
  );
}

function waitingWords(parts: PartsAtCounterState): string {
  return parts.waiting.map((line) => `${line.quantity} × ${line.sku || line.description} (${COUNTER_STATUS_LABELS[line.status]})`).join(', ');
}

/** Starting with parts still waiting at the counter asks first, naming them; with every part there it starts at once. */
function StartInBayButton({ order, loading, onStart }: { order: WorkOrder; loading: boolean; onStart: () => void }) {
  const waiting = order.partsAtCounter?.waiting ?? [];
  const button = (
    <Button type="primary" loading={loading} onClick={waiting.length === 0 ? onStart : undefined}>
      Start in the bay
    </Button>
  );
  if (waiting.length === 0) return button;
  return (
    <Popconfirm
      title="Start with parts still waiting?"
      description={
        <span style={{ display: 'block', maxWidth: 320 }}>
          Not with the job yet: {waitingWords(order.partsAtCounter!)}. The bay may stop at the steps that need them.
        </span>
      }
      okText="Start in the bay"
      cancelText="Not yet"
      onConfirm={onStart}
    >
      {button}
    </Popconfirm>
  );
}
