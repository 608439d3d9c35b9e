import { App, Button, Flex, Input, InputNumber, Tag, Typography } from 'antd';
import { useState } from 'react';
import { formatDateTime } from '@/lib/dates';
import { getErrorMessage } from '@/lib/api-error';
import { useRecordCheck } from '../api/record-check';
import type { WorkCheck } from '../types';
import { CheckPhotos } from './check-photos';

export interface CheckRecorderProps {
  workOrderId: string;
  check: WorkCheck;
  /** Recording is open while the job is in the bay, to those who may record. */
  canRecord: boolean;
}

const FIT_STATUS_WORDS = { ok: 'fits', tight: 'tight', fails: 'does not fit', unknown: 'not known' } as const;

/** One check: what it asks, its allowed range, the newest recording with who and when, and the controls to record it. */
export function CheckRecorder({ workOrderId, check, canRecord }: CheckRecorderProps) {
  const record = useRecordCheck(workOrderId);
  const { message } = App.useApp();
  const [value, setValue] = useState<number | null>(null);
  const [note, setNote] = useState('');
  const latest = check.latest;
  const send = (body: { value?: number; passed?: boolean }) =>
    record.mutate(
      { checkKey: check.key, ...body, ...(note.trim() && { note: note.trim() }) },
      {
        onSuccess: () => {
          setValue(null);
          setNote('');
        },
        onError: (error) => void message.error(getErrorMessage(error)),
      },
    );
  return (
    <div className="work-order-check" data-testid={`check-${check.key}`} data-result={latest?.result ?? 'open'}>
      <Flex justify="space-between" gap={8} wrap>
        <Typography.Text strong>{check.label}</Typography.Text>
        {latest ? (
          <Tag color={latest.result === 'pass' ? 'success' : 'error'} data-testid="check-result">
            {latest.result === 'pass' ? 'Pass' : 'Failed'}
            {latest.value !== null ? ` · ${latest.value} ${check.unit ?? ''}`.trimEnd() : ''}
          </Tag>
        ) : (
          <Tag data-testid="check-result">Open</Tag>
        )}
      </Flex>
      {check.measured && (
        <Typography.Text type="secondary" style={{ display: 'block' }}>
          Allowed {check.range}
          {check.rangeFrom ? ` (from ${check.rangeFrom})` : ''}
        </Typography.Text>
      )}
      {check.fitFinding && (
        <Typography.Text type="secondary" style={{ display: 'block' }} data-testid="check-fit-finding">
          Fit check, {check.fitFinding.title}: {FIT_STATUS_WORDS[check.fitFinding.status]}. {check.fitFinding.message}
        </Typography.Text>
      )}
      {latest && (
        <Typography.Text type="secondary" style={{ display: 'block', fontSize: 13 }}>
          Recorded by {latest.recordedByName}, {formatDateTime(latest.recordedAt)}
          {check.recordings > 1 ? ` (${check.recordings} recordings)` : ''}
          {latest.note ? ` · ${latest.note}` : ''}
        </Typography.Text>
      )}
      {canRecord && (
        <div className="work-order-check__controls">
          {check.measured ? (
            <>
              <InputNumber
                aria-label={`Value for ${check.label}`}
                value={value}
                onChange={(next) => setValue(typeof next === 'number' ? next : null)}
                inputMode="decimal"
                step={0.5}
                addonAfter={check.unit ?? undefined}
                style={{ width: 150 }}
              />
              <Button type="primary" disabled={value === null} loading={record.isPending} onClick={() => value !== null && send({ value })}>
                Record value
              </Button>
            </>
          ) : (
            <>
              <Button type="primary" loading={record.isPending} onClick={() => send({ passed: true })}>
                Done as described
              </Button>
              <Button danger loading={record.isPending} onClick={() => send({ passed: false })}>
                Not right
              </Button>
            </>
          )}
          <Input aria-label={`Note for ${check.label}`} placeholder="Note (optional)" value={note} onChange={(event) => setNote(event.target.value)} maxLength={500} style={{ flex: '1 1 160px' }} />
        </div>
      )}
      <CheckPhotos workOrderId={workOrderId} check={check} canAdd={canRecord} />
    </div>
  );
}
