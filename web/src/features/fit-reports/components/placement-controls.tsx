import type { Placement } from '@swapwright/shared';
import { Alert, Button, Col, Flex, InputNumber, Row, Slider, Tag, Typography } from 'antd';
import { useState } from 'react';
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

/** The placement the API accepts (setback and height in mm, tilt in degrees). */
export const PLACEMENT_LIMITS = {
  setbackMm: { min: -1500, max: 5000 },
  heightMm: { min: 0, max: 2500 },
  tiltDeg: { min: -20, max: 20 },
} as const;

type Axis = keyof typeof PLACEMENT_LIMITS;

const inLimits = (axis: Axis, v: number) => Number.isFinite(v) && v >= PLACEMENT_LIMITS[axis].min && v <= PLACEMENT_LIMITS[axis].max;

/** Axes of a placement outside what can be saved. */
export function placementOutOfRange(p: Placement): Axis[] {
  return (Object.keys(PLACEMENT_LIMITS) as Axis[]).filter((axis) => !inLimits(axis, p[axis]));
}

type AxisRowProps = {
  label: string;
  hint: string;
  ariaLabel: string;
  valueDisplay: number;
  min: number;
  max: number;
  /** What the number box accepts, in display units (the slider range sits inside it). */
  limitMin: number;
  limitMax: number;
  step: number;
  unit: string;
  onChange: (displayValue: number) => void;
  /** Reports typed text outside the limits (the number box only passes on values inside them). */
  onInvalid: (invalid: boolean) => void;
  invalid: boolean;
};

function AxisRow({ label, hint, ariaLabel, valueDisplay, min, max, limitMin, limitMax, step, unit, onChange, onInvalid, invalid }: AxisRowProps) {
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
            min={limitMin}
            max={limitMax}
            step={step}
            suffix={unit}
            status={invalid ? 'error' : undefined}
            style={{ width: '100%' }}
            onInput={(text) => {
              const n = Number(text);
              onInvalid(text.trim() !== '' && Number.isFinite(n) && (n < limitMin || n > limitMax));
            }}
            onBlur={() => onInvalid(false)}
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
  const [typedOut, setTypedOut] = useState<Partial<Record<Axis, boolean>>>({});
  const center = saved ?? value;
  const lengthStep = units.system === 'in' ? 0.05 : 1;
  const clampTo = (axis: Axis, v: number) => Math.min(PLACEMENT_LIMITS[axis].max, Math.max(PLACEMENT_LIMITS[axis].min, v));
  /** Slider range around the saved value, widened to the current value, never past the limits. */
  const lengthRange = (axis: 'setbackMm' | 'heightMm') => {
    const lo = Math.min(center[axis] - SPAN_MM, value[axis]);
    const hi = Math.max(center[axis] + SPAN_MM, value[axis]);
    return {
      min: units.toDisplay(clampTo(axis, lo)),
      max: units.toDisplay(clampTo(axis, hi)),
      // rounded inwards so a limit shown in inches never converts back past the limit
      limitMin: Math.ceil(units.toDisplay(PLACEMENT_LIMITS[axis].min) * 100) / 100,
      limitMax: Math.floor(units.toDisplay(PLACEMENT_LIMITS[axis].max) * 100) / 100,
    };
  };
  const axisState = (axis: Axis) => ({
    invalid: Boolean(typedOut[axis]) || !inLimits(axis, value[axis]),
    onInvalid: (invalid: boolean) => setTypedOut((s) => (Boolean(s[axis]) === invalid ? s : { ...s, [axis]: invalid })),
  });
  const limitText: Record<Axis, string> = {
    setbackMm: `Setback must be between ${units.formatLength(PLACEMENT_LIMITS.setbackMm.min)} and ${units.formatLength(PLACEMENT_LIMITS.setbackMm.max)}.`,
    heightMm: `Crank height must be between ${units.formatLength(PLACEMENT_LIMITS.heightMm.min)} and ${units.formatLength(PLACEMENT_LIMITS.heightMm.max)}.`,
    tiltDeg: `Tilt must be between ${PLACEMENT_LIMITS.tiltDeg.min}° and +${PLACEMENT_LIMITS.tiltDeg.max}°.`,
  };
  const problems = (Object.keys(PLACEMENT_LIMITS) as Axis[]).filter((axis) => axisState(axis).invalid);

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
        {...lengthRange('setbackMm')}
        {...axisState('setbackMm')}
        valueDisplay={units.toDisplay(value.setbackMm)}
        onChange={(v) => onChange({ ...value, setbackMm: units.fromDisplay(v) })}
      />
      <AxisRow
        label="Crank height"
        hint="crank centerline above the ground"
        ariaLabel="Crank height"
        unit={units.unitLabel}
        step={lengthStep}
        {...lengthRange('heightMm')}
        {...axisState('heightMm')}
        valueDisplay={units.toDisplay(value.heightMm)}
        onChange={(v) => onChange({ ...value, heightMm: units.fromDisplay(v) })}
      />
      <AxisRow
        label="Tilt"
        hint="front up is positive"
        ariaLabel="Tilt"
        unit="°"
        step={0.1}
        min={clampTo('tiltDeg', Math.min(-5, value.tiltDeg))}
        max={clampTo('tiltDeg', Math.max(10, value.tiltDeg))}
        limitMin={PLACEMENT_LIMITS.tiltDeg.min}
        limitMax={PLACEMENT_LIMITS.tiltDeg.max}
        {...axisState('tiltDeg')}
        valueDisplay={Math.round(value.tiltDeg * 10) / 10}
        onChange={(v) => onChange({ ...value, tiltDeg: v })}
      />
      {proposed && (
        <Typography.Text type="secondary" style={{ fontSize: 13 }} data-testid="proposed-placement">
          Proposed by the fit window: {units.formatLength(proposed.setbackMm)} back, {units.formatLength(proposed.heightMm)} up, {proposed.tiltDeg.toFixed(1)}°
        </Typography.Text>
      )}
      {problems.length > 0 && (
        <Alert
          type="warning"
          showIcon
          data-testid="placement-out-of-range"
          title="Out of range"
          description={problems.map((axis) => limitText[axis]).join(' ')}
        />
      )}
      <Flex gap={8} wrap>
        {onSave && (
          <Button type="primary" onClick={onSave} loading={saving} disabled={problems.length > 0}>
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
