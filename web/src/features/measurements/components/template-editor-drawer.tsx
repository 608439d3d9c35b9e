import { Button, Card, Drawer, Flex, Form, Input, Select, Switch, Typography } from 'antd';
import { useEffect, useState } from 'react';
import { FormErrorAlert } from '@/components/form-error-alert';
import { ErrorState, LoadingState } from '@/components/query-state';
import { useDrawerSize } from '@/hooks/use-drawer-size';
import { notifySuccess } from '@/lib/notifier';
import { useMeasurementTemplate } from '../api/get-measurement-template';
import { useUpdateMeasurementTemplate } from '../api/update-measurement-template';
import { kindLabel, kindNeeds, MEASUREMENT_POINT_KINDS, newPointId, toEditablePoint } from '../lib/template-edits';
import type { EditableMeasurementPoint } from '../types';

type NewPoint = { kind: EditableMeasurementPoint['kind']; label: string; howTo: string; target?: string; atX?: string; required: boolean };

export type TemplateEditorDrawerProps = { chassisId: string; open: boolean; onClose: () => void };

/**
 * The shop's measurement points for a chassis model: rename them, say how to measure, mark them required or not,
 * remove them, or add one (for example a crossmember a previous owner welded in). Every sheet of the model follows.
 */
export function TemplateEditorDrawer({ chassisId, open, onClose }: TemplateEditorDrawerProps) {
  const size = useDrawerSize(640);
  const template = useMeasurementTemplate(chassisId, { enabled: open });
  const update = useUpdateMeasurementTemplate(chassisId);
  const [points, setPoints] = useState<EditableMeasurementPoint[]>([]);
  const [error, setError] = useState<unknown>(null);
  const [form] = Form.useForm<NewPoint>();
  const kind = Form.useWatch('kind', form);

  useEffect(() => {
    if (open && template.data) setPoints(template.data.points.map(toEditablePoint));
    if (open) setError(null);
  }, [open, template.data]);

  const change = (index: number, patch: Partial<EditableMeasurementPoint>) =>
    setPoints((list) => list.map((p, i) => (i === index ? { ...p, ...patch } : p)));

  const addPoint = (values: NewPoint) => {
    const atX = values.atX?.trim() ? Number(values.atX) : undefined;
    setPoints((list) => [
      ...list,
      {
        id: newPointId(values.label, new Set(list.map((p) => p.id))),
        kind: values.kind,
        label: values.label.trim(),
        howTo: values.howTo?.trim() ?? '',
        catalogValue: null,
        required: values.required,
        ...(values.target?.trim() && { target: values.target.trim() }),
        ...(atX !== undefined && Number.isFinite(atX) && { atX }),
      },
    ]);
    form.resetFields();
  };

  const save = async () => {
    setError(null);
    try {
      await update.mutateAsync({ points });
      notifySuccess({ title: 'Measurement points saved', description: 'Every sheet of this chassis model now lists them.' });
      onClose();
    } catch (e) {
      setError(e);
    }
  };

  const needs = kind ? kindNeeds(kind) : { station: false };

  return (
    <Drawer
      open={open}
      onClose={onClose}
      size={size}
      title="Measurement points of this chassis model"
      destroyOnHidden
      extra={
        <Flex gap={8}>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="primary" loading={update.isPending} onClick={() => void save()} disabled={!template.data}>
            Save points
          </Button>
        </Flex>
      }
    >
      {template.isPending ? (
        <LoadingState rows={8} />
      ) : template.isError ? (
        <ErrorState error={template.error} onRetry={() => void template.refetch()} />
      ) : (
        <Flex vertical gap={12}>
          <FormErrorAlert error={error} />
          <Typography.Paragraph type="secondary" style={{ margin: 0 }}>
            Readings already on a sheet stay with their point id; a removed point drops out of the sheets and the fit check.
          </Typography.Paragraph>
          {points.map((point, index) => (
            <Card key={point.id} size="small" data-testid="template-point">
              <Flex vertical gap={6}>
                <Input aria-label={`Name of ${point.id}`} value={point.label} maxLength={160} onChange={(e) => change(index, { label: e.target.value })} />
                <Input.TextArea
                  aria-label={`How to measure ${point.id}`}
                  value={point.howTo}
                  maxLength={1000}
                  autoSize={{ minRows: 1, maxRows: 4 }}
                  onChange={(e) => change(index, { howTo: e.target.value })}
                />
                <Flex justify="space-between" align="center" wrap gap={8}>
                  <Typography.Text type="secondary" style={{ fontSize: 12 }}>
                    {kindLabel(point.kind)}
                    {point.target ? ` · ${point.target}` : ''}
                  </Typography.Text>
                  <Flex gap={12} align="center">
                    <label style={{ display: 'flex', gap: 6, alignItems: 'center' }}>
                      <Switch size="small" checked={point.required} onChange={(required) => change(index, { required })} />
                      Required
                    </label>
                    <Button size="small" danger type="text" onClick={() => setPoints((list) => list.filter((_, i) => i !== index))}>
                      Remove
                    </Button>
                  </Flex>
                </Flex>
              </Flex>
            </Card>
          ))}
          <Card size="small" title="Add a point">
            <Form<NewPoint> form={form} layout="vertical" onFinish={addPoint} initialValues={{ required: true }} requiredMark="optional">
              <Form.Item name="kind" label="What it measures" rules={[{ required: true, message: 'Choose what the point measures.' }]}>
                <Select options={MEASUREMENT_POINT_KINDS.map((k) => ({ value: k, label: kindLabel(k) }))} showSearch />
              </Form.Item>
              <Form.Item name="label" label="Name" rules={[{ required: true, whitespace: true, message: 'Name the point as the shop calls it.' }, { max: 160 }]}>
                <Input maxLength={160} />
              </Form.Item>
              <Form.Item name="howTo" label="Where to hold the tape">
                <Input.TextArea maxLength={1000} autoSize={{ minRows: 2 }} />
              </Form.Item>
              {needs.target && (
                <Form.Item
                  name="target"
                  label={needs.target === 'obstacle' ? 'Obstacle id (a new id adds a crossmember the catalog lacks)' : needs.target === 'side' ? 'Side (left or right)' : 'Corner (front-left, …)'}
                  rules={[{ required: true, whitespace: true, message: 'This kind of point needs it.' }, { pattern: /^[\w.@-]{1,80}$/, message: 'Letters, digits, dots and dashes only.' }]}
                >
                  <Input maxLength={80} />
                </Form.Item>
              )}
              {needs.station && (
                <Form.Item name="atX" label="Station: mm behind the front axle line (negative ahead)" rules={[{ pattern: /^-?\d+(\.\d+)?$/, message: 'A number of millimetres.' }]}>
                  <Input inputMode="decimal" />
                </Form.Item>
              )}
              <Form.Item name="required" label="Required before sign-off" valuePropName="checked">
                <Switch />
              </Form.Item>
              <Button htmlType="submit">Add to the list</Button>
            </Form>
          </Card>
        </Flex>
      )}
    </Drawer>
  );
}
