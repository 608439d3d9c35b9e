import type { Placement } from '@swapwright/shared';
import { Button, Col, Flex, InputNumber, Row, Slider, Tag, Typography } from 'antd';
import { useUnits } from '@/hooks/use-units';

export type PlacementControlsProps = {
  value: Placement;
  onChange: (next: Placement) => void;
  /** The placement stored on the project (the sliders range around it). */
  saved: Placement | null;
  proposed?: Placement | null;
  /** True while the figures shown come from an unsaved placement. */
  isPreview: boolean;
  onSave?: () => void;
  saving?: boolean;
  onReset?: () => void;
};

const SPAN_MM = 200;

type AxisRowProps = {
  label: string;
  hint: string;
  ariaLabel: string;
  valueDisplay: number;
  min: number;
  max: number;
  step: number;
  unit: string;
  onChange: (displayValue: number) => void;
};

function AxisRow({ label, hint, ariaLabel, valueDisplay, min, max, step, unit, onChange }: AxisRowProps) {
  return (
    <div>
      <Flex justify="space-between" align="baseline">
        <Typography.Text strong>{label}</Typography.Text>
        <Typography.Text type="secondary" style={{ fontSize: 12 }}>
          {hint}
        </Typography.Text>
      </Flex>
      <Row gutter={12} align="middle">
        <Col flex="auto">
          <Slider
            min={min}
            max={max}
            step={step}
            value={valueDisplay}
            onChange={(v) => onChange(v as number)}
            tooltip={{ formatter: (v) => `${v} ${unit}` }}
            ariaLabelForHandle={`${ariaLabel} slider`}
          />
        </Col>
        <Col flex="150px">
          <InputNumber
            aria-label={ariaLabel}
            value={valueDisplay}
            step={step}
            suffix={unit}
            style={{ width: '100%' }}
            onChange={(v) => {
              if (typeof v === 'number' && Number.isFinite(v)) onChange(v);
            }}
          />
        </Col>
      </Row>
    </div>
  );
}

/** Setback, crank height and tilt in the person's units; every change re-runs the fit engine here in the browser. */
export function PlacementControls({ value, onChange, saved, proposed, isPreview, onSave, saving, onReset }: PlacementControlsProps) {
  const units = useUnits();
  const center = saved ?? value;
  const lengthStep = units.system === 'in' ? 0.05 : 1;
  const range = (mm: number, lo = -Infinity) => ({
    min: units.toDisplay(Math.max(lo, mm - SPAN_MM)),
    max: units.toDisplay(mm + SPAN_MM),
  });
  const setback = range(center.setbackMm);
  const height = range(center.heightMm, 0);
  const widen = (r: { min: number; max: number }, v: number) => ({ min: Math.min(r.min, v), max: Math.max(r.max, v) });

  return (
    <Flex vertical gap={12} className="fit-placement-controls fit-control" data-testid="placement-controls">
      <Flex justify="space-between" align="center" wrap gap={8}>
        <Typography.Title level={5} style={{ margin: 0 }}>
          Engine placement
        </Typography.Title>
        {isPreview ? (
          <Tag color="gold" data-testid="preview-badge">
            Preview, not saved
          </Tag>
        ) : (
          <Tag>As saved</Tag>
        )}
      </Flex>
      <AxisRow
        label="Setback"
        hint="bellhousing face behind the front axle"
        ariaLabel="Setback"
        unit={units.unitLabel}
        step={lengthStep}
        {...widen(setback, units.toDisplay(value.setbackMm))}
        valueDisplay={units.toDisplay(value.setbackMm)}
        onChange={(v) => onChange({ ...value, setbackMm: units.fromDisplay(v) })}
      />
      <AxisRow
        label="Crank height"
        hint="crank centerline above the ground"
        ariaLabel="Crank height"
        unit={units.unitLabel}
        step={lengthStep}
        {...widen(height, units.toDisplay(value.heightMm))}
        valueDisplay={units.toDisplay(value.heightMm)}
        onChange={(v) => onChange({ ...value, heightMm: units.fromDisplay(v) })}
      />
      <AxisRow
        label="Tilt"
        hint="front up is positive"
        ariaLabel="Tilt"
        unit="°"
        step={0.1}
        min={Math.min(-5, value.tiltDeg)}
        max={Math.max(10, value.tiltDeg)}
        valueDisplay={Math.round(value.tiltDeg * 10) / 10}
        onChange={(v) => onChange({ ...value, tiltDeg: v })}
      />
      {proposed && (
        <Typography.Text type="secondary" style={{ fontSize: 13 }} data-testid="proposed-placement">
          Proposed by the fit window: {units.formatLength(proposed.setbackMm)} back, {units.formatLength(proposed.heightMm)} up, {proposed.tiltDeg.toFixed(1)}°
        </Typography.Text>
      )}
      <Flex gap={8} wrap>
        {onSave && (
          <Button type="primary" onClick={onSave} loading={saving}>
            Save placement
          </Button>
        )}
        {proposed && (
          <Button onClick={() => onChange({ ...proposed })} disabled={samePlacement(proposed, value)}>
            Use proposed placement
          </Button>
        )}
        {onReset && isPreview && <Button onClick={onReset}>Back to saved</Button>}
      </Flex>
      <Typography.Paragraph type="secondary" style={{ margin: 0, fontSize: 12 }}>
        Moving these re-checks the fit here on your screen. Save the placement, then run the fit check to store a report. Set the engine
        on the mounts only with it supported on a rated hoist.
      </Typography.Paragraph>
    </Flex>
  );
}

export function samePlacement(a: Placement | null | undefined, b: Placement | null | undefined): boolean {
  if (!a || !b) return a === b;
  return Math.abs(a.setbackMm - b.setbackMm) < 0.05 && Math.abs(a.heightMm - b.heightMm) < 0.05 && Math.abs(a.tiltDeg - b.tiltDeg) < 0.005;
}
