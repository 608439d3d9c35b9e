import { Alert, Button, Card, Col, Form, Row, Typography } from 'antd';
import { useEffect } from 'react';
import { DEFAULT_DEVIATION_LIMITS, DEVIATION_LIMIT_BOUNDS } from '@swapwright/shared';
import { BoundedNumberInput, plainNumberRule, rangeRule } from '@/components/bounded-number-input';
import { FormErrorAlert } from '@/components/form-error-alert';
import { LengthInput, readableLengthRule } from '@/components/length-input';
import { ErrorState, LoadingState } from '@/components/query-state';
import { useUnits } from '@/hooks/use-units';
import { notifySuccess } from '@/lib/notifier';
import { useMeasurementSettings } from '../api/get-measurement-settings';
import { useUpdateMeasurementSettings } from '../api/update-measurement-settings';
import type { MeasurementSettingsBody } from '../types';

export type DeviationLimitsFormProps = { canEdit: boolean };

type Values = { deviationLimitMm: number | null; deviationLimitDeg: number | null };

const LENGTH = DEVIATION_LIMIT_BOUNDS.lengthMm;
const ANGLE = DEVIATION_LIMIT_BOUNDS.angleDeg;

/**
 * The shop's "take a second look" limits: a reading on a measurement sheet further than this from what the catalog
 * predicts for the truck is flagged on the sheet and in the fit report. The owner sets them; the API checks the same bounds.
 */
export function DeviationLimitsForm({ canEdit }: DeviationLimitsFormProps) {
  const units = useUnits();
  const settings = useMeasurementSettings();
  const [form] = Form.useForm<Values>();
  const update = useUpdateMeasurementSettings({ onSuccess: () => notifySuccess({ title: 'Measurement limits saved', description: 'Every sheet flags readings against them now.' }) });

  useEffect(() => {
    if (settings.data) form.setFieldsValue({ deviationLimitMm: settings.data.deviationLimitMm, deviationLimitDeg: settings.data.deviationLimitDeg });
  }, [settings.data, form]);

  const lengthShown = (mm: number) => (units.system === 'in' ? `${units.formatLength(mm)} (${mm} mm)` : units.formatLength(mm));

  const submit = (v: Values) => {
    const body: MeasurementSettingsBody = {
      // the box reads inches to 0.01; keep the stored millimetres to a hundredth
      deviationLimitMm: Math.round((v.deviationLimitMm ?? 0) * 100) / 100,
      deviationLimitDeg: v.deviationLimitDeg ?? 0,
    };
    update.mutate(body);
  };

  return (
    <Card title="Measurements: readings far from the catalog" style={{ marginBottom: 16, maxWidth: 720 }} data-testid="deviation-limits">
      {settings.isPending ? (
        <LoadingState rows={3} />
      ) : settings.isError ? (
        <ErrorState error={settings.error} onRetry={() => void settings.refetch()} />
      ) : (
        <Form<Values> form={form} layout="vertical" onFinish={submit} disabled={!canEdit} aria-label="Measurement limits">
          <Typography.Paragraph type="secondary">
            A reading on a measurement sheet that is further than this from what the catalog gives for the truck is marked
            &ldquo;Far from catalog&rdquo; on the sheet and in the fit report, so someone measures it again before cutting or ordering.
          </Typography.Paragraph>
          <FormErrorAlert error={update.error} />
          <Row gutter={16}>
            <Col xs={24} sm={12}>
              <Form.Item
                label="Lengths (heights, widths, distances)"
                name="deviationLimitMm"
                extra={`Default ${lengthShown(DEFAULT_DEVIATION_LIMITS.lengthMm)}. Between ${lengthShown(LENGTH.min)} and ${lengthShown(LENGTH.max)}.`}
                rules={[
                  { required: true, message: 'Enter how far a length may be from the catalog' },
                  readableLengthRule('Length limit'),
                  rangeRule('Length limit', LENGTH, lengthShown),
                ]}
              >
                <LengthInput aria-label="Length limit" />
              </Form.Item>
            </Col>
            <Col xs={24} sm={12}>
              <Form.Item
                label="Angles (pinion, driveline)"
                name="deviationLimitDeg"
                extra={`Default ${DEFAULT_DEVIATION_LIMITS.angleDeg}°. Between ${ANGLE.min}° and ${ANGLE.max}°.`}
                rules={[
                  { required: true, message: 'Enter how far an angle may be from the catalog' },
                  plainNumberRule('Angle limit', '1.5'),
                  rangeRule('Angle limit', ANGLE, (v) => `${v}°`),
                ]}
              >
                <BoundedNumberInput style={{ width: '100%' }} min={ANGLE.min} max={ANGLE.max} precision={2} step={0.1} suffix="°" aria-label="Angle limit" />
              </Form.Item>
            </Col>
          </Row>
          {canEdit ? (
            <Button type="primary" htmlType="submit" loading={update.isPending}>
              Save limits
            </Button>
          ) : (
            <Alert type="info" showIcon title="The shop owner sets these limits." />
          )}
        </Form>
      )}
    </Card>
  );
}
