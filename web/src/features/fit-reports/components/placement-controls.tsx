import { inchesToMm, mmToInches, type Placement } from '@swapwright/shared';
import { Alert, Button, Col, Flex, Row, Slider, Tag, Typography } from 'antd';
import { useState } from 'react';
import { ParsedNumberInput } from '@/components/parsed-number-input';
import { useUnits } from '@/hooks/use-units';
import { readAngle, readLength, type ReadResult } from '@/lib/units';

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
  /** The held value (mm or degrees) and the slider's range around it, in the same unit. */
  value: number;
  sliderMin: number;
  sliderMax: number;
  /** What can be saved; a typed value outside it is refused with `rangeMessage`. */
  limitMin: number;
  limitMax: number;
  /** Slider and arrow-key step, in the held unit. */
  step: number;
  unit: string;
  toDisplay: (value: number) => number;
  fromDisplay: (display: number) => number;
  read: (text: string) => ReadResult;
  rangeMessage: string;
  onChange: (value: number) => void;
  onProblem: (message: string | null) => void;
  invalid: boolean;
};

function AxisRow({ label, hint, value, sliderMin, sliderMax, limitMin, limitMax, step, unit, toDisplay, fromDisplay, read, rangeMessage, onChange, onProblem, invalid }: AxisRowProps) {
  return (
    <div>
      <Flex justify="space-between" align="baseline" wrap gap={4}>
        <Typography.Text strong>{label}</Typography.Text>
        <Typography.Text type="secondary" style={{ fontSize: 12 }}>
          {hint}
        </Typography.Text>
      </Flex>
      <Row gutter={12} align="middle" wrap={false}>
        <Col flex="auto" style={{ minWidth: 0 }}>
          <Slider
            min={toDisplay(sliderMin)}
            max={toDisplay(sliderMax)}
            step={toDisplay(step) || undefined}
            value={toDisplay(value)}
            onChange={(v) => onChange(fromDisplay(v as number))}
            tooltip={{ formatter: (v) => `${v} ${unit}` }}
            ariaLabelForHandle={`${label} slider`}
          />
        </Col>
        <Col flex="130px">
          <ParsedNumberInput
            label={label}
            value={value}
            onChange={onChange}
            read={read}
            toDisplay={toDisplay}
            min={limitMin}
            max={limitMax}
            step={step}
            rangeMessage={rangeMessage}
            suffix={unit}
            onProblem={onProblem}
            invalid={invalid}
            style={{ width: '100%' }}
          />
        </Col>
      </Row>
    </div>
  );
}

const plain = new Intl.NumberFormat('en-US', { maximumFractionDigits: 2 });
const roundDegrees = (v: number) => Math.round(v * 10) / 10;

/**
 * Setback, crank height and tilt in the person's units; every change re-runs the fit engine here in the browser.
 * The boxes read fractions, decimals and either unit (`21 1/2`, `21.5 in`, `546 mm`) and refuse, with a message,
 * what they cannot read or what lies outside the limits.
 */
export function PlacementControls({ value, onChange, saved, proposed, isPreview, onSave, saving, onReset }: PlacementControlsProps) {
  const units = useUnits();
  const [typed, setTyped] = useState<Partial<Record<Axis, string | null>>>({});
  const center = saved ?? value;
  const lengthStep = units.system === 'in' ? inchesToMm(0.05) : 1;
  const clampTo = (axis: Axis, v: number) => Math.min(PLACEMENT_LIMITS[axis].max, Math.max(PLACEMENT_LIMITS[axis].min, v));
  /** The limits as the person reads them, rounded inwards so a figure typed at a limit converts back inside it. */
  const unrounded = (mm: number) => (units.system === 'in' ? mmToInches(mm) : mm);
  const shownLimits = (axis: 'setbackMm' | 'heightMm') => ({
    min: Math.ceil(unrounded(PLACEMENT_LIMITS[axis].min) * 100) / 100,
    max: Math.floor(unrounded(PLACEMENT_LIMITS[axis].max) * 100) / 100,
  });
  const lengthAxis = (axis: 'setbackMm' | 'heightMm', name: string) => {
    const shown = shownLimits(axis);
    return {
      // slider range around the saved value, widened to the current value, never past the limits
      sliderMin: clampTo(axis, Math.min(center[axis] - SPAN_MM, value[axis])),
      sliderMax: clampTo(axis, Math.max(center[axis] + SPAN_MM, value[axis])),
      limitMin: units.fromDisplay(shown.min),
      limitMax: units.fromDisplay(shown.max),
      step: lengthStep,
      unit: units.unitLabel,
      toDisplay: units.toDisplay,
      fromDisplay: units.fromDisplay,
      read: (text: string) => readLength(text, units.system),
      rangeMessage: `${name} must be between ${plain.format(shown.min)} ${units.unitLabel} and ${plain.format(shown.max)} ${units.unitLabel}.`,
      value: value[axis],
      onChange: (mm: number) => onChange({ ...value, [axis]: mm }),
      ...axisState(axis),
    };
  };
  const axisState = (axis: Axis) => ({
    invalid: Boolean(typed[axis]) || !inLimits(axis, value[axis]),
    onProblem: (message: string | null) => setTyped((s) => ((s[axis] ?? null) === message ? s : { ...s, [axis]: message })),
  });
  const limitText: Record<Axis, string> = {
    setbackMm: lengthAxis('setbackMm', 'Setback').rangeMessage,
    heightMm: lengthAxis('heightMm', 'Crank height').rangeMessage,
    tiltDeg: `Tilt must be between ${PLACEMENT_LIMITS.tiltDeg.min}° and +${PLACEMENT_LIMITS.tiltDeg.max}°.`,
  };
  const axes = Object.keys(PLACEMENT_LIMITS) as Axis[];
  const problems = axes.filter((axis) => axisState(axis).invalid).map((axis) => typed[axis] ?? limitText[axis]);

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
      <AxisRow label="Setback" hint="bellhousing face behind the front axle" {...lengthAxis('setbackMm', 'Setback')} />
      <AxisRow label="Crank height" hint="crank centerline above the ground" {...lengthAxis('heightMm', 'Crank height')} />
      <AxisRow
        label="Tilt"
        hint="front up is positive"
        unit="°"
        step={0.1}
        value={value.tiltDeg}
        sliderMin={clampTo('tiltDeg', Math.min(-5, value.tiltDeg))}
        sliderMax={clampTo('tiltDeg', Math.max(10, value.tiltDeg))}
        limitMin={PLACEMENT_LIMITS.tiltDeg.min}
        limitMax={PLACEMENT_LIMITS.tiltDeg.max}
        toDisplay={roundDegrees}
        fromDisplay={(v) => v}
        read={readAngle}
        rangeMessage={limitText.tiltDeg}
        onChange={(tiltDeg) => onChange({ ...value, tiltDeg })}
        {...axisState('tiltDeg')}
      />
      {proposed && (
        <Typography.Text type="secondary" style={{ fontSize: 13 }} data-testid="proposed-placement">
          Proposed: {units.formatLength(proposed.setbackMm)} back, {units.formatLength(proposed.heightMm)} up, {proposed.tiltDeg.toFixed(1)}°
        </Typography.Text>
      )}
      {problems.length > 0 && (
        <Alert
          type="warning"
          showIcon
          data-testid="placement-out-of-range"
          title="Check these figures"
          description={problems.join(' ')}
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
