import { Alert, Button, Card, Collapse, Flex, Input, Popconfirm, Tag, Typography } from 'antd';
import { useState } from 'react';
import { formatDateTime } from '@/lib/dates';
import { getErrorMessage } from '@/lib/api-error';
import { isReadingChanged } from '../api/set-measurement-value';
import type { PhotoUpload } from '../hooks/use-photo-uploads';
import { compareReading, formatReading, formatTolerance, readEntry, unitSlip, valueBody, type SheetRow, type UnitSystem } from '../lib/sheet-state';
import type { SetMeasurementValueBody } from '../types';
import { PhotoStrip, type PhotoActions } from './photo-strip';
import { PointDrawing } from './point-drawing';
import { ReasonModal } from './reason-modal';

export type MeasurementPointCardProps = {
  row: SheetRow;
  system: UnitSystem;
  formatLength: (mm: number) => string;
  signedOff: boolean;
  canEdit: boolean;
  onSave: (pointId: string, body: SetMeasurementValueBody) => Promise<unknown>;
  uploads: PhotoUpload[];
  uploadedIds: ReadonlySet<string>;
  photoActions: PhotoActions;
};

type ReadingPreviewProps = { reading: ReturnType<typeof readEntry>; fmt: (v: number, unit: 'mm' | 'deg') => string; catalogValue: number | null; system: UnitSystem };

function ReadingPreview({ reading, fmt, catalogValue, system }: ReadingPreviewProps) {
  if (reading.ok === null) return null;
  if (reading.ok === false) {
    return (
      <Typography.Text type="danger" role="alert" style={{ fontSize: 13 }}>
        {reading.message}
      </Typography.Text>
    );
  }
  return (
    <>
      <Typography.Text type="secondary" style={{ fontSize: 13 }} data-testid="reading-preview">
        Reads as {fmt(reading.value, reading.unit)}
        {reading.unit === 'mm' && ` (${Math.round(reading.value * 10) / 10} mm)`}
      </Typography.Text>
      {catalogValue !== null && unitSlip(reading, { catalogValue }) && (
        <Typography.Text type="warning" style={{ fontSize: 13 }} data-testid="unit-slip">
          That is far from the catalog&apos;s {fmt(catalogValue, 'mm')}: check the unit. A bare number is read in{' '}
          {system === 'in' ? 'inches' : 'millimetres'}; add mm, in or ft after the figure to say which.
        </Typography.Text>
      )}
    </>
  );
}

/** One point of the sheet: where and how to measure it, a big box for the reading, its history and its photos. */
export function MeasurementPointCard({ row, system, formatLength, signedOff, canEdit, onSave, uploads, uploadedIds, photoActions }: MeasurementPointCardProps) {
  const { point, value } = row;
  const [text, setText] = useState('');
  const [tolerance, setTolerance] = useState('');
  const [note, setNote] = useState('');
  const [askReason, setAskReason] = useState(false);
  const [saving, setSaving] = useState(false);
  const [error, setError] = useState<string | null>(null);
  /** The version of the reading shown when the person started typing (0: none): the one their save replaces. */
  const [seenVersion, setSeenVersion] = useState<number | null>(null);
  /** Someone saved another reading after the person started typing: the API's sentence and the reason given, if any. */
  const [conflict, setConflict] = useState<{ message: string; seenVersion: number; reason?: string } | null>(null);
  /** A reading far from the catalog (most often a figure in the other unit) is saved only after a second yes. */
  const [confirmingSlip, setConfirmingSlip] = useState(false);
  const fmt = (v: number, unit: 'mm' | 'deg') => formatReading(v, unit, formatLength);
  const comparison = value ? compareReading(value, point, system, formatLength) : null;
  const against = comparison?.movedByRideHeight ? 'what the catalog predicts at this ride height' : 'the catalog';
  const reading = readEntry(text, point, system);
  const toleranceReading = readEntry(tolerance, point, system);
  const slip = reading.ok === true && point.catalogValue !== null && unitSlip(reading, { catalogValue: point.catalogValue });
  /** Saves, after the reason for changing a signed-off sheet when it is one. */
  const commit = () => (signedOff ? setAskReason(true) : void save());
  const submit = () => (slip ? setConfirmingSlip(true) : commit());
  const unitHint = point.unit === 'deg' ? 'degrees, e.g. 2.5 or -1.5°' : system === 'in' ? 'e.g. 12 1/2", 12.5 in or 318 mm' : 'e.g. 318 mm, 12 1/2" or 12.5 in';

  const clear = () => {
    setText('');
    setTolerance('');
    setNote('');
    setSeenVersion(null);
    setConflict(null);
  };

  /** Saves over the reading the person saw, or (`overVersion`) over the one they chose to replace. */
  const save = async (reason?: string, overVersion?: number) => {
    if (reading.ok !== true) return;
    if (toleranceReading.ok === false) return;
    const replaces = overVersion ?? seenVersion ?? value?.version ?? 0;
    setSaving(true);
    setError(null);
    try {
      await onSave(
        point.id,
        valueBody(reading, { toleranceMm: toleranceReading.ok ? Math.abs(toleranceReading.value) : null, note, reason, seenVersion: replaces }),
      );
      clear();
      setAskReason(false);
    } catch (e) {
      if (isReadingChanged(e)) setConflict({ message: getErrorMessage(e), seenVersion: replaces, reason });
      else setError(getErrorMessage(e));
      setAskReason(false);
    } finally {
      setSaving(false);
    }
  };

  const onType = (next: string) => {
    if (text.trim() === '' && next.trim() !== '') setSeenVersion(value?.version ?? 0);
    if (next.trim() === '') setSeenVersion(null);
    setText(next);
  };
  // their reading is on screen once the sheet is fetched again after the refusal
  const theirsShown = conflict !== null && value !== null && value.version !== conflict.seenVersion;

  const status = row.flagged ? (
    <Tag color="red">Far from catalog</Tag>
  ) : value ? (
    <Tag color="green">Measured</Tag>
  ) : row.missing ? (
    <Tag color="orange">Missing</Tag>
  ) : (
    <Tag>Optional</Tag>
  );

  return (
    <Card
      size="small"
      data-testid="point-card"
      data-point-id={point.id}
      title={
        <Flex justify="space-between" align="center" gap={8}>
          <span style={{ whiteSpace: 'normal', lineHeight: 1.3, padding: '6px 0' }}>{point.label}</span>
          {status}
        </Flex>
      }
    >
      <Flex vertical gap={10}>
        <Flex gap={12} wrap align="flex-start">
          <PointDrawing point={point} />
          <Typography.Paragraph type="secondary" style={{ flex: '1 1 160px', margin: 0, fontSize: 13 }}>
            {point.howTo}
          </Typography.Paragraph>
        </Flex>

        <Flex gap={16} wrap>
          <div>
            <Typography.Text type="secondary" style={{ fontSize: 12 }}>
              Reading
            </Typography.Text>
            <div style={{ fontSize: 22, fontWeight: 600 }} data-testid="point-value">
              {value ? fmt(value.value, point.unit) : '—'}
              {value?.tolerance !== null && value?.tolerance !== undefined && (
                <span style={{ fontSize: 14, fontWeight: 400 }} data-testid="point-tolerance"> ± {formatTolerance(value.tolerance, point.unit, system, formatLength)}</span>
              )}
            </div>
          </div>
          {point.catalogValue !== null && (
            <div>
              <Typography.Text type="secondary" style={{ fontSize: 12 }}>
                Catalog
              </Typography.Text>
              <div style={{ fontSize: 16, paddingTop: 4 }} data-testid="point-catalog">
                {fmt(point.catalogValue, point.unit)}
              </div>
            </div>
          )}
          {comparison?.movedByRideHeight && (
            <div>
              <Typography.Text type="secondary" style={{ fontSize: 12 }}>
                Expected at this ride height
              </Typography.Text>
              <div style={{ fontSize: 16, paddingTop: 4 }} data-testid="point-expected">
                {fmt(comparison.expected, point.unit)}
              </div>
            </div>
          )}
        </Flex>
        {value && (
          <Typography.Text type="secondary" style={{ fontSize: 13 }} data-testid="measured-by">
            Measured by {value.measuredBy}, {formatDateTime(value.measuredAt)}
            {comparison && ` · ${comparison.difference} from ${comparison.movedByRideHeight ? 'the expected figure' : 'the catalog'}`}
            {value.note && ` · ${value.note}`}
          </Typography.Text>
        )}
        {row.flagged && comparison && (
          <Alert
            type="warning"
            showIcon
            title="Far from the catalog: take a second look"
            description={`This reading is ${comparison.difference} from ${against}. Measure it again before cutting or ordering; if it holds, the fit check uses it.`}
          />
        )}

        {canEdit && (
          <Flex vertical gap={6}>
            <Input
              size="large"
              inputMode="text"
              autoComplete="off"
              aria-label={`Reading: ${point.label}`}
              placeholder={value ? `New reading (${unitHint})` : unitHint}
              value={text}
              status={reading.ok === false ? 'error' : undefined}
              onChange={(e) => onType(e.target.value)}
              onPressEnter={submit}
              style={{ fontSize: 20, height: 52 }}
            />
            <ReadingPreview reading={reading} fmt={fmt} catalogValue={point.catalogValue} system={system} />
            <Flex gap={8} wrap>
              <Input
                aria-label={`Tolerance: ${point.label}`}
                placeholder={point.unit === 'deg' ? '± degrees' : '± tolerance'}
                value={tolerance}
                status={toleranceReading.ok === false ? 'error' : undefined}
                onChange={(e) => setTolerance(e.target.value)}
                style={{ flex: '1 1 110px', height: 44 }}
              />
              <Input
                aria-label={`Note: ${point.label}`}
                placeholder="Note"
                maxLength={500}
                value={note}
                onChange={(e) => setNote(e.target.value)}
                style={{ flex: '2 1 160px', height: 44 }}
              />
            </Flex>
            {toleranceReading.ok === false && (
              <Typography.Text type="danger" style={{ fontSize: 13 }}>
                Tolerance: {toleranceReading.message}
              </Typography.Text>
            )}
            {error && <Alert type="error" showIcon title="Not saved" description={error} />}
            {conflict && (
              <Alert
                type="warning"
                showIcon
                data-testid="reading-conflict"
                title="Someone else saved this reading meanwhile"
                description={
                  <Flex vertical gap={8}>
                    <span>{conflict.message}</span>
                    <dl style={{ margin: 0, display: 'grid', gridTemplateColumns: 'auto 1fr', gap: '2px 10px' }}>
                      <dt>Theirs</dt>
                      <dd style={{ margin: 0 }} data-testid="conflict-theirs">
                        {theirsShown ? `${fmt(value.value, point.unit)} (${value.measuredBy}, ${formatDateTime(value.measuredAt)})` : 'Loading…'}
                      </dd>
                      <dt>Yours</dt>
                      <dd style={{ margin: 0 }} data-testid="conflict-yours">
                        {reading.ok === true ? fmt(reading.value, reading.unit) : '—'}
                      </dd>
                    </dl>
                    <Flex gap={8} wrap>
                      <Button onClick={clear} style={{ minHeight: 44 }}>
                        Keep theirs
                      </Button>
                      <Button
                        danger
                        disabled={!theirsShown || reading.ok !== true}
                        loading={saving}
                        onClick={() => value && void save(conflict.reason, value.version)}
                        style={{ minHeight: 44 }}
                      >
                        Save mine over it
                      </Button>
                    </Flex>
                  </Flex>
                }
              />
            )}
            <Popconfirm
              open={confirmingSlip && slip}
              onOpenChange={(open) => !open && setConfirmingSlip(false)}
              title="Far from the catalog: save it as read?"
              description={
                reading.ok === true && point.catalogValue !== null ? (
                  <span style={{ display: 'block', maxWidth: 300 }} data-testid="unit-slip-confirm">
                    It reads as {fmt(reading.value, reading.unit)}; the catalog has {fmt(point.catalogValue, 'mm')}. If the tape said something else, fix the
                    figure or add its unit (mm, in or ft).
                  </span>
                ) : null
              }
              okText="Save as read"
              cancelText="Fix it"
              onConfirm={() => {
                setConfirmingSlip(false);
                commit();
              }}
            >
              <Button
                type="primary"
                size="large"
                block
                disabled={reading.ok !== true || toleranceReading.ok === false || conflict !== null}
                loading={saving && !askReason}
                onClick={submit}
                style={{ height: 48 }}
              >
                {value ? 'Save new reading' : 'Save reading'}
              </Button>
            </Popconfirm>
          </Flex>
        )}

        <PhotoStrip label={point.label} pointId={point.id} photos={row.photos} uploads={uploads} uploadedIds={uploadedIds} actions={photoActions} />

        {row.history.length > 0 && (
          <Collapse
            size="small"
            ghost
            items={[
              {
                key: 'history',
                label: `History (${row.history.length})`,
                children: (
                  <ul style={{ margin: 0, paddingLeft: 18 }} aria-label={`History: ${point.label}`}>
                    {row.history.map((e, i) => (
                      <li key={`${e.at}-${i}`} style={{ fontSize: 13 }}>
                        {e.oldValue === null ? 'First reading' : `${fmt(e.oldValue, point.unit)} →`} {e.newValue !== null && fmt(e.newValue, point.unit)}, {e.by},{' '}
                        {formatDateTime(e.at)}
                        {e.reason && <> · reason: {e.reason}</>}
                      </li>
                    ))}
                  </ul>
                ),
              },
            ]}
          />
        )}
      </Flex>
      <ReasonModal
        open={askReason}
        pointLabel={point.label}
        change={`${value ? fmt(value.value, point.unit) : '—'} → ${reading.ok === true ? fmt(reading.value, reading.unit) : '—'}`}
        saving={saving}
        onCancel={() => setAskReason(false)}
        onConfirm={(reason) => void save(reason)}
      />
    </Card>
  );
}
