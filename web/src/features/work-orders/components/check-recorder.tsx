import { renderText, textParts } from '@swapwright/shared';
import { App, Button, Flex, Input, InputNumber, Tag, Typography } from 'antd';
import { useState } from 'react';
import { useUnits } from '@/hooks/use-units';
import { formatDateTime } from '@/lib/dates';
import { getErrorMessage } from '@/lib/api-error';
import { useRecordCheck } from '../api/record-check';
import { allowedRange, formatCheckLength, isLengthCheck, readCheckLength } from '../lib/check-units';
import type { WorkCheck } from '../types';
import { CheckPhotos } from './check-photos';

export interface CheckRecorderProps {
  workOrderId: string;
  check: WorkCheck;
  /** Recording is open while the job is in the bay, to those who may record. */
  canRecord: boolean;
}

const FIT_STATUS_WORDS = { ok: 'fits', tight: 'tight', fails: 'does not fit', unknown: 'not known' } as const;

/**
 * One check: what it asks, its allowed range, the newest recording with who and when, and the controls to record it.
 * A length check reads and takes lengths in the person's units (stored in mm): `1/2"`, `12.7 mm` or a bare number.
 */
export function CheckRecorder({ workOrderId, check, canRecord }: CheckRecorderProps) {
  const record = useRecordCheck(workOrderId);
  const { message } = App.useApp();
  const { system } = useUnits();
  const [value, setValue] = useState<number | null>(null);
  const [lengthText, setLengthText] = useState('');
  const [note, setNote] = useState('');
  /** "Not right" was pressed with an empty note: the note box asks what is wrong. */
  const [noteWanted, setNoteWanted] = useState(false);
  const latest = check.latest;
  const isLength = isLengthCheck(check);
  const reading = readCheckLength(lengthText, system);
  const shownValue = (v: number) => (isLength ? formatCheckLength(v, system) : `${v} ${check.unit ?? ''}`.trimEnd());
  const send = (body: { value?: number; passed?: boolean }) =>
    record.mutate(
      { checkKey: check.key, ...body, ...(note.trim() && { note: note.trim() }) },
      {
        onSuccess: () => {
          setValue(null);
          setLengthText('');
          setNote('');
          setNoteWanted(false);
        },
        onError: (error) => void message.error(getErrorMessage(error)),
      },
    );
  const notRight = () => {
    if (!note.trim()) {
      setNoteWanted(true);
      return;
    }
    send({ passed: false });
  };
  return (
    <div className="work-order-check" data-testid={`check-${check.key}`} data-result={latest?.result ?? 'open'}>
      <Flex justify="space-between" gap={8} wrap>
        <Typography.Text strong>{renderText(textParts(check.label), system)}</Typography.Text>
        {latest ? (
          <Tag color={latest.result === 'pass' ? 'success' : 'error'} data-testid="check-result">
            {latest.result === 'pass' ? 'Pass' : 'Failed'}
            {latest.value !== null ? ` · ${shownValue(latest.value)}` : ''}
          </Tag>
        ) : (
          <Tag data-testid="check-result">Open</Tag>
        )}
      </Flex>
      {check.measured && (
        <Typography.Text type="secondary" style={{ display: 'block' }}>
          Allowed {allowedRange(check, system)}
          {check.rangeFrom ? ` (from ${check.rangeFrom})` : ''}
        </Typography.Text>
      )}
      {check.fitFinding && (
        <Typography.Text type="secondary" style={{ display: 'block' }} data-testid="check-fit-finding">
          {check.fitFinding.resolvedBy
            ? `Fit check, ${check.fitFinding.title}: resolved in the plan by ${check.fitFinding.resolvedBy}: measure after fitting.`
            : `Fit check, ${check.fitFinding.title}: ${FIT_STATUS_WORDS[check.fitFinding.status]}. ${renderText(textParts(check.fitFinding.message), system)}`}
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
          {check.measured && isLength ? (
            <>
              <Input
                aria-label={`Value for ${check.label}`}
                placeholder={system === 'in' ? 'e.g. 1/2", 0.5 in or 13 mm' : 'e.g. 13 mm, 1/2" or 0.5 in'}
                value={lengthText}
                status={reading.ok === false ? 'error' : undefined}
                onChange={(event) => setLengthText(event.target.value)}
                onPressEnter={() => reading.ok === true && send({ value: reading.mm })}
                inputMode="text"
                autoComplete="off"
                style={{ width: 190 }}
              />
              <Button type="primary" disabled={reading.ok !== true} loading={record.isPending} onClick={() => reading.ok === true && send({ value: reading.mm })}>
                Record value
              </Button>
            </>
          ) : check.measured ? (
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
              {/* solid only for what is recorded: the buttons never contradict the badge */}
              <Button
                type={latest?.result === 'pass' ? 'primary' : 'default'}
                aria-pressed={latest?.result === 'pass'}
                loading={record.isPending}
                onClick={() => send({ passed: true })}
              >
                Done as described
              </Button>
              <Button
                danger
                type={latest?.result === 'fail' ? 'primary' : 'default'}
                aria-pressed={latest?.result === 'fail'}
                loading={record.isPending}
                onClick={notRight}
              >
                Not right
              </Button>
            </>
          )}
          <Input
            aria-label={`Note for ${check.label}`}
            placeholder={check.measured ? 'Note (optional)' : 'Note (say what is wrong when not right)'}
            value={note}
            status={noteWanted && !note.trim() ? 'error' : undefined}
            onChange={(event) => setNote(event.target.value)}
            maxLength={500}
            style={{ flex: '1 1 160px' }}
          />
        </div>
      )}
      {canRecord && noteWanted && !note.trim() && (
        <Typography.Text type="danger" role="alert" style={{ display: 'block', fontSize: 13 }} data-testid="check-note-wanted">
          Say in the note what is not right (what you found and where), then press Not right again.
        </Typography.Text>
      )}
      {canRecord && check.measured && isLength && reading.ok !== null && (
        <Typography.Text type={reading.ok ? 'secondary' : 'danger'} role={reading.ok ? undefined : 'alert'} style={{ display: 'block', fontSize: 13 }} data-testid="check-reading">
          {reading.ok ? `Reads as ${formatCheckLength(reading.mm, system)}${system === 'in' ? ` (${formatCheckLength(reading.mm, 'mm')})` : ''}` : reading.message}
        </Typography.Text>
      )}
      <CheckPhotos workOrderId={workOrderId} check={check} canAdd={canRecord} />
    </div>
  );
}
