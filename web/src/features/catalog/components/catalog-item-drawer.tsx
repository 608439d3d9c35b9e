import { formatBeltDesignation } from '@swapwright/shared';
import { Button, Checkbox, Divider, Drawer, Flex, Form, Input, InputNumber, Select, Typography, type FormInstance } from 'antd';
import { useEffect, useState } from 'react';
import { FormErrorAlert } from '@/components/form-error-alert';
import { rangeRule } from '@/components/bounded-number-input';
import { useCreateCatalogItem } from '../api/create-catalog-item';
import { useUpdateCatalogItem } from '../api/update-catalog-item';
import { kindDefinitions, type JsonField, type ScalarField } from '../lib/catalog-kinds';
import type { CatalogItem, CatalogItemInputOf, CatalogKind } from '../types';
import { LengthInput, readableLengthRule } from '@/components/length-input';
import { useUnits } from '@/hooks/use-units';
import { FrameDiagram } from './frame-diagram';
import { ObstaclesEditor, obstaclesRule } from './obstacles-editor';
import { OutlineEditor, outlineRule, translateOutlineErrors } from './outline-editor';
import { useDrawerSize } from '@/hooks/use-drawer-size';

export type CatalogItemDrawerProps = { kind: CatalogKind; open: boolean; item?: CatalogItem | null; onClose: () => void };

type FormValues = Record<string, unknown> & { name: string };

const jsonKey = (name: string) => `json:${name}`;

/** Parses a JSON field's text, with a message a person can act on. */
export function parseJsonField(text: unknown, field: Pick<JsonField, 'label' | 'shape' | 'required'>): { ok: true; value: unknown } | { ok: false; message: string } {
  const raw = typeof text === 'string' ? text.trim() : '';
  if (!raw) return field.required ? { ok: false, message: `${field.label} is required.` } : { ok: true, value: undefined };
  try {
    const value = JSON.parse(raw) as unknown;
    if (field.shape === 'array' && !Array.isArray(value)) return { ok: false, message: `${field.label} must be a list in square brackets [ … ].` };
    if (field.shape === 'object' && (typeof value !== 'object' || value === null || Array.isArray(value)))
      return { ok: false, message: `${field.label} must be an object in braces { … }.` };
    return { ok: true, value };
  } catch (error) {
    return { ok: false, message: `${field.label} is not valid JSON: ${error instanceof Error ? error.message : String(error)}` };
  }
}

function toFormValues(kind: CatalogKind, item: CatalogItem | null | undefined): FormValues {
  const def = kindDefinitions[kind];
  const spec: Record<string, unknown> = { ...def.defaults, ...(item?.spec ?? {}) };
  const values: FormValues = { name: item?.name ?? (spec.name as string) ?? '' };
  for (const f of def.fields) values[f.name] = spec[f.name];
  for (const o of def.outlines) values[o.name] = spec[o.name] ?? [];
  if (def.obstacles) values.obstacles = spec.obstacles ?? [];
  for (const j of def.json) values[jsonKey(j.name)] = spec[j.name] === undefined || spec[j.name] === null ? '' : JSON.stringify(spec[j.name], null, 2);
  if (kind === 'chassis') {
    const dp = item && 'defaultPlacement' in item ? item.defaultPlacement : null;
    values[jsonKey('defaultPlacement')] = dp ? JSON.stringify(dp, null, 2) : '';
  }
  return values;
}

function toBody(kind: CatalogKind, values: FormValues): Record<string, unknown> {
  const def = kindDefinitions[kind];
  const body: Record<string, unknown> = { name: values.name.trim() };
  for (const f of def.fields) {
    const v = values[f.name];
    if (v === undefined || v === null || v === '') continue;
    body[f.name] = v;
  }
  for (const o of def.outlines) body[o.name] = values[o.name] ?? [];
  if (def.obstacles) body.obstacles = values.obstacles ?? [];
  const jsonFields: JsonField[] = [...def.json, ...(kind === 'chassis' ? [{ name: 'defaultPlacement', label: 'Stock engine placement', shape: 'object' as const, help: '' }] : [])];
  for (const j of jsonFields) {
    const parsed = parseJsonField(values[jsonKey(j.name)], j);
    if (parsed.ok && parsed.value !== undefined) body[j.name] = parsed.value;
  }
  return body;
}

/** Form.Item hands value and onChange to its direct child: pass them through to the real control. */
type ControlProps = { value?: unknown; onChange?: (value: unknown) => void; checked?: boolean; id?: string };

function ScalarInput({ field, ...control }: { field: ScalarField } & ControlProps) {
  const p = control as Record<string, never>;
  switch (field.type) {
    case 'length':
      return <LengthInput aria-label={field.label} {...p} />;
    case 'number':
      return <InputNumber aria-label={field.label} style={{ width: '100%' }} min={field.min} max={field.max} suffix={field.suffix} {...p} />;
    case 'select':
      return <Select aria-label={field.label} options={field.options} {...p} />;
    case 'multi':
      return <Select aria-label={field.label} mode="multiple" options={field.options} {...p} />;
    case 'tags':
      return <Select aria-label={field.label} mode="tags" tokenSeparators={[',']} open={false} suffixIcon={null} placeholder="Type and press Enter" {...p} />;
    case 'boolean':
      return (
        <Checkbox aria-label={field.label} {...p}>
          Yes
        </Checkbox>
      );
    default:
      return <Input aria-label={field.label} maxLength={80} {...p} />;
  }
}

function fieldRules(field: ScalarField, formatLength: (mm: number) => string) {
  const rules: Array<Record<string, unknown>> = [];
  if (field.required && field.type !== 'boolean') rules.push({ required: true, message: `${field.label} is required.` });
  if (field.type === 'length') rules.push(readableLengthRule(field.label));
  const shown = (v: number) => (field.type === 'length' ? formatLength(v) : `${v}${field.suffix ? ` ${field.suffix}` : ''}`);
  if ((field.type === 'number' || field.type === 'length') && (field.min !== undefined || field.max !== undefined))
    rules.push(rangeRule(field.label, field, shown));
  return rules;
}

/** The belt's name as stamped on it, from the typed ribs and length; the server computes the stored one the same way. */
function BeltDesignationPreview({ form }: { form: FormInstance<FormValues> }) {
  const ribs = Form.useWatch('ribs', form) as unknown;
  const length = Form.useWatch('effectiveLengthMm', form) as unknown;
  const valid = typeof ribs === 'number' && Number.isInteger(ribs) && ribs >= 1 && typeof length === 'number' && length > 0;
  return (
    <Typography.Paragraph type="secondary" data-testid="belt-designation">
      Designation: {valid ? formatBeltDesignation(ribs, length) : '—'}
    </Typography.Paragraph>
  );
}

/** Create or edit one catalog entry: its scalar figures, point lists and the nested parts as JSON. */
export function CatalogItemDrawer({ kind, open, item, onClose }: CatalogItemDrawerProps) {
  const def = kindDefinitions[kind];
  const units = useUnits();
  const [form] = Form.useForm<FormValues>();
  const drawerSize = useDrawerSize(720);
  const [error, setError] = useState<unknown>(null);
  const create = useCreateCatalogItem({ onSuccess: onClose });
  const update = useUpdateCatalogItem({ onSuccess: onClose });
  const saving = create.isPending || update.isPending;

  useEffect(() => {
    if (open) {
      form.resetFields();
      form.setFieldsValue(toFormValues(kind, item));
      setError(null);
    }
  }, [open, kind, item, form]);

  const submit = async (values: FormValues) => {
    setError(null);
    // built from the kind's field list; the API validates it against the kind's own body schema
    const body = toBody(kind, values) as CatalogItemInputOf<CatalogKind>;
    try {
      if (item) await update.mutateAsync({ kind, id: item.id, changes: body });
      else await create.mutateAsync({ kind, input: body });
    } catch (e) {
      setError(e);
    }
  };

  const jsonFields: JsonField[] = [
    ...def.json,
    ...(kind === 'chassis' ? [{ name: 'defaultPlacement', label: 'Stock engine placement', shape: 'object' as const, help: '{ "setbackMm", "heightMm", "tiltDeg" }: where the original engine sat' }] : []),
  ];

  return (
    <Drawer
      open={open}
      onClose={onClose}
      size={drawerSize}
      title={item ? `Edit ${def.singular}: ${item.name}` : `New ${def.singular}`}
      destroyOnHidden
      extra={
        <Flex gap={8}>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="primary" loading={saving} onClick={() => form.submit()}>
            {item ? 'Save changes' : `Add ${def.singular}`}
          </Button>
        </Flex>
      }
    >
      <FormErrorAlert error={error} translate={(t) => translateOutlineErrors(t, def.outlines)} />
      <Form<FormValues> form={form} layout="vertical" onFinish={submit} requiredMark="optional" scrollToFirstError>
        {def.measuredFrom && <FrameDiagram from={def.measuredFrom} />}
        <Form.Item name="name" label="Name" rules={[{ required: true, whitespace: true, message: 'Give it a name the shop will recognise.' }, { max: 160 }]}>
          <Input maxLength={160} />
        </Form.Item>
        <Flex wrap gap="0 16px">
          {def.fields.map((f) => (
            <Form.Item
              key={f.name}
              name={f.name}
              label={f.label}
              help={f.help}
              rules={fieldRules(f, units.formatLength)}
              valuePropName={f.type === 'boolean' ? 'checked' : 'value'}
              style={{ flex: '1 1 200px', minWidth: 200 }}
            >
              <ScalarInput field={f} />
            </Form.Item>
          ))}
        </Flex>
        {kind === 'belts' && <BeltDesignationPreview form={form} />}
        {def.outlines.map((o) => (
          <div key={o.name}>
            <Divider titlePlacement="start" plain>
              {o.label}
            </Divider>
            <Typography.Paragraph type="secondary" style={{ fontSize: 13 }}>
              {o.help}
            </Typography.Paragraph>
            <Form.Item name={o.name} rules={o.minPoints > 0 || o.negativeAxis ? [outlineRule(o.minPoints, o.label, o.negativeAxis)] : []}>
              <OutlineEditor axes={o.axes} label={o.label} closed={o.closed} />
            </Form.Item>
          </div>
        ))}
        {def.obstacles && (
          <>
            <Divider titlePlacement="start" plain>
              Obstacles (side view)
            </Divider>
            <Typography.Paragraph type="secondary" style={{ fontSize: 13 }}>
              Crossmember, steering linkage, axle at full bump, firewall and tunnel, each a closed outline in the chassis frame: x rearward
              from the front axle, z up from the ground.
            </Typography.Paragraph>
            <Form.Item name="obstacles" rules={[obstaclesRule]}>
              <ObstaclesEditor />
            </Form.Item>
          </>
        )}
        {jsonFields.length > 0 && (
          <Divider titlePlacement="start" plain>
            Nested parts (JSON, millimetres)
          </Divider>
        )}
        {jsonFields.map((j) => (
          <Form.Item
            key={j.name}
            name={jsonKey(j.name)}
            label={j.label}
            extra={j.help}
            rules={[
              {
                validator: async (_: unknown, text: unknown) => {
                  const parsed = parseJsonField(text, j);
                  if (!parsed.ok) throw new Error(parsed.message);
                },
              },
            ]}
          >
            <Input.TextArea autoSize={{ minRows: 2, maxRows: 14 }} spellCheck={false} style={{ fontFamily: 'ui-monospace, SFMono-Regular, Menlo, monospace', fontSize: 13 }} />
          </Form.Item>
        ))}
      </Form>
    </Drawer>
  );
}
