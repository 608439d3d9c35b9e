import { AutoComplete, Button, Col, Divider, Form, Input, InputNumber, Row, Select, Table, Typography, type FormInstance } from 'antd';
import { PART_CATEGORIES, PART_CATEGORY_LABELS, type CatalogPartCategory } from '@swapwright/shared';
import { useEffect, useState } from 'react';
import { FormErrorAlert } from '@/components/form-error-alert';
import { FormDrawer } from '@/components/form-drawer';
import { notifySuccess } from '@/lib/notifier';
import type { Part } from '../api/get-parts';
import { useSuppliers } from '../api/get-suppliers';
import { useSavePart } from '../api/save-part';
import { type StockInput, useSetPartStock } from '../api/set-part-stock';
import { useUnits } from '@/hooks/use-units';
import {
  attributeBoxUnit,
  attributeHint,
  attributeKeyOf,
  attributeWords,
  formValuesToBody,
  isLengthAttribute,
  KNOWN_ATTRIBUTES,
  partToFormValues,
  readLengthAttribute,
  type PartFormValues,
} from '../lib/part-form-values';

export type PartFormDrawerProps = {
  open: boolean;
  /** Edit this part; create a new one when absent. */
  part?: Part | null;
  onClose: () => void;
};

const SKU_RULE = { pattern: /^[A-Za-z0-9][A-Za-z0-9._/-]*$/, message: 'Letters, digits and - _ . / only, starting with a letter or digit' };

/** Units on hand and bin per location of a saved part. */
function StockSection({ part }: { part: Part }) {
  const [form] = Form.useForm<StockInput>();
  const [saved, setSaved] = useState<Part>(part);
  const setStock = useSetPartStock({
    onSuccess: (next) => {
      setSaved(next);
      notifySuccess({ title: 'Stock saved', description: `${next.sku}: ${next.onHand} on hand` });
      form.resetFields();
    },
  });
  useEffect(() => setSaved(part), [part]);
  return (
    <>
      <Divider titlePlacement="start">Stock by location</Divider>
      <Table
        size="small"
        rowKey="id"
        pagination={false}
        dataSource={saved.stock}
        locale={{ emptyText: 'No stock yet: set the units on hand at a location below.' }}
        columns={[
          { title: 'Location', dataIndex: 'location' },
          { title: 'Bin', dataIndex: 'bin', render: (bin: string) => bin || '—' },
          { title: 'On hand', dataIndex: 'onHand', align: 'right' },
          { title: 'Reserved', dataIndex: 'reserved', align: 'right' },
        ]}
      />
      <Form<StockInput>
        form={form}
        layout="vertical"
        aria-label="Stock at a location"
        requiredMark="optional"
        style={{ marginTop: 12 }}
        onFinish={(values) => setStock.mutate({ id: part.id, stock: { location: values.location.trim(), bin: values.bin?.trim() || undefined, onHand: values.onHand } })}
      >
        <FormErrorAlert error={setStock.error} />
        <Row gutter={8}>
          <Col xs={24} sm={10}>
            <Form.Item label="Location" name="location" rules={[{ required: true, whitespace: true, message: 'Enter the location' }, { max: 60 }]}>
              <AutoComplete options={[...new Set(saved.stock.map((s) => s.location))].map((value) => ({ value }))} placeholder="Main store" />
            </Form.Item>
          </Col>
          <Col xs={12} sm={7}>
            <Form.Item label="Bin" name="bin" rules={[{ max: 40 }]}>
              <Input placeholder="A-03-2" />
            </Form.Item>
          </Col>
          <Col xs={12} sm={7}>
            <Form.Item label="On hand" name="onHand" rules={[{ required: true, message: 'Enter the units on hand' }]}>
              <InputNumber min={0} max={1_000_000} precision={0} style={{ width: '100%' }} />
            </Form.Item>
          </Col>
        </Row>
        <Button htmlType="submit" loading={setStock.isPending}>
          Set stock at this location
        </Button>
      </Form>
    </>
  );
}

const ATTRIBUTE_OPTIONS = KNOWN_ATTRIBUTES.map((key) => ({ value: attributeWords(key) }));

/**
 * One attribute row's value box (with the unit it takes) and what the row says, in words and the person's units. A
 * length's box takes the person's units (inches in inch mode; a figure with its unit, "60 mm", also reads).
 */
function AttributeValueItem({ form, index }: { form: FormInstance<PartFormValues>; index: number }) {
  const units = useUnits();
  const row = Form.useWatch(['attributes', index], form) as PartFormValues['attributes'][number] | undefined;
  const key = row?.name ? attributeKeyOf(row.name) : undefined;
  const isLength = key !== undefined && isLengthAttribute(key);
  const hint = attributeHint(row?.name, row?.value, units.system);
  const readsAsLength = {
    validator: async (_: unknown, text: unknown) => {
      const name = form.getFieldValue(['attributes', index, 'name']) as string | undefined;
      if (!name || !isLengthAttribute(attributeKeyOf(name)) || typeof text !== 'string' || !text.trim()) return;
      const length = readLengthAttribute(text, units.system);
      if (!length.ok) throw new Error(length.message);
    },
  };
  return (
    <Form.Item
      name={[index, 'value']}
      dependencies={[['attributes', index, 'name']]}
      rules={[{ required: true, whitespace: true, message: 'Enter its value' }, readsAsLength]}
      extra={hint ? <span data-testid="attribute-hint">Reads: {hint}</span> : undefined}
    >
      <Input
        aria-label="Attribute value"
        placeholder={isLength ? (units.system === 'in' ? '2.362' : '60') : 'rear'}
        inputMode={isLength ? 'decimal' : undefined}
        suffix={key ? attributeBoxUnit(key, units.system) : undefined}
      />
    </Form.Item>
  );
}

/** Create or edit a catalog part: category, prices, supplier, install hours, torque specs and instructions, fitment attributes and rules. */
export function PartFormDrawer({ open, part, onClose }: PartFormDrawerProps) {
  const [form] = Form.useForm<PartFormValues>();
  const units = useUnits();
  const [supplierSearch, setSupplierSearch] = useState('');
  const suppliers = useSuppliers({ page: 1, pageSize: 20, ...(supplierSearch ? { search: supplierSearch } : {}) });
  const isEdit = Boolean(part);
  const save = useSavePart({
    onSuccess: (saved) => {
      notifySuccess({ title: isEdit ? 'Part saved' : 'Part added', description: `${saved.sku} ${saved.description}` });
      onClose();
    },
  });

  useEffect(() => {
    if (!open) return;
    save.reset();
    form.setFieldsValue(partToFormValues(part, units.system));
    // reset only when the drawer opens for a (new) record
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [open, part]);

  const supplierOptions = (suppliers.data?.items ?? []).map((s) => ({ value: s.id, label: s.name }));
  if (part?.supplierId && !supplierOptions.some((o) => o.value === part.supplierId)) supplierOptions.push({ value: part.supplierId, label: part.supplierName ?? '' });
  const skuList = (name: 'requiresSkus' | 'excludesSkus' | 'replacesSkus', label: string, extra: string) => (
    <Form.Item label={label} name={name} extra={extra}>
      <Select mode="tags" tokenSeparators={[',', ' ']} placeholder="Type a SKU and press Enter" open={false} aria-label={label} />
    </Form.Item>
  );

  return (
    <FormDrawer
      open={open}
      onClose={onClose}
      title={isEdit ? `Edit ${part?.sku}` : 'New part'}
      width={640}
      submitLabel={isEdit ? 'Save part' : 'Add part'}
      saving={save.isPending}
      onSubmit={() => form.submit()}
    >
      <Form<PartFormValues>
        form={form}
        layout="vertical"
        aria-label="Part"
        requiredMark="optional"
        onFinish={(values) => save.mutate({ id: part?.id, body: formValuesToBody(values, units.system, part?.attributes) })}
      >
        <FormErrorAlert error={save.error} />
        <Row gutter={12}>
          <Col xs={24} sm={10}>
            <Form.Item label="SKU" name="sku" rules={[{ required: true, whitespace: true, message: 'Enter the SKU' }, { max: 64 }, SKU_RULE]}>
              <Input placeholder="TR-4410" autoFocus={!isEdit} />
            </Form.Item>
          </Col>
          <Col xs={24} sm={14}>
            <Form.Item label="Category" name="category" rules={[{ required: true, message: 'Choose the category' }]}>
              <Select<CatalogPartCategory>
                showSearch={{ optionFilterProp: 'label' }}
                placeholder="Choose a category"
                options={PART_CATEGORIES.map((value) => ({ value, label: PART_CATEGORY_LABELS[value] }))}
              />
            </Form.Item>
          </Col>
        </Row>
        <Form.Item label="Description" name="description" rules={[{ required: true, whitespace: true, message: 'Describe the part' }, { max: 240 }]}>
          <Input placeholder="Rear-sump swap pan" />
        </Form.Item>
        <Row gutter={12}>
          <Col xs={12} sm={8}>
            <Form.Item label="Price" name="price" rules={[{ required: true, message: 'Enter the selling price' }]}>
              <InputNumber min={0} max={1_000_000} precision={2} prefix="$" style={{ width: '100%' }} />
            </Form.Item>
          </Col>
          <Col xs={12} sm={8}>
            <Form.Item label="Cost" name="cost" extra="What the shop pays.">
              <InputNumber min={0} max={1_000_000} precision={2} prefix="$" style={{ width: '100%' }} />
            </Form.Item>
          </Col>
          <Col xs={24} sm={8}>
            <Form.Item label="Install labor (h)" name="laborHours">
              <InputNumber min={0} max={500} step={0.1} precision={1} style={{ width: '100%' }} />
            </Form.Item>
          </Col>
        </Row>
        <Row gutter={12}>
          <Col xs={24} sm={14}>
            <Form.Item label="Supplier" name="supplierId">
              <Select
                allowClear
                showSearch={{ filterOption: false, onSearch: setSupplierSearch }}
                placeholder="Search suppliers"
                loading={suppliers.isFetching}
                options={supplierOptions}
              />
            </Form.Item>
          </Col>
          <Col xs={24} sm={10}>
            <Form.Item label="Supplier SKU" name="supplierSku" rules={[{ max: 64 }]}>
              <Input />
            </Form.Item>
          </Col>
        </Row>

        <Divider titlePlacement="start">Torque specs and instructions</Divider>
        <Form.List name="torqueSpecs">
          {(fields, { add, remove }) => (
            <>
              {fields.map((field) => (
                <Row key={field.key} gutter={8} align="top">
                  <Col xs={24} sm={10}>
                    <Form.Item name={[field.name, 'fastener']} label="Fastener" rules={[{ required: true, whitespace: true, message: 'Name the fastener' }, { max: 120 }]}>
                      <Input placeholder="Pan bolts" />
                    </Form.Item>
                  </Col>
                  <Col xs={10} sm={5}>
                    <Form.Item name={[field.name, 'newtonMetres']} label="N·m" rules={[{ required: true, message: 'Enter the torque' }]}>
                      <InputNumber min={0} max={5000} style={{ width: '100%' }} />
                    </Form.Item>
                  </Col>
                  <Col xs={12} sm={7}>
                    <Form.Item name={[field.name, 'sequence']} label="Sequence" rules={[{ max: 240 }]}>
                      <Input placeholder="Centre out, two passes" />
                    </Form.Item>
                  </Col>
                  <Col xs={2} sm={2}>
                    <Button type="link" danger aria-label="Remove torque spec" onClick={() => remove(field.name)} style={{ marginTop: 30, paddingInline: 0 }}>
                      ✕
                    </Button>
                  </Col>
                </Row>
              ))}
              <Button onClick={() => add({})} style={{ marginBottom: 16 }}>
                Add torque spec
              </Button>
            </>
          )}
        </Form.List>
        <Form.Item label="Instructions" name="instructions" rules={[{ max: 4000 }]} extra="Shown on the work order.">
          <Input.TextArea rows={3} showCount maxLength={4000} />
        </Form.Item>

        <Divider titlePlacement="start">Fitment attributes</Divider>
        <Typography.Paragraph type="secondary">
          What the plan's rules compare, such as the sump position (rear), the pickup mounting (pump-bolted), the pump inlet or the
          flow. Pick a name from the list or type your own; a list of values is typed with commas; a length is typed in {units.system === 'in' ? 'inches' : 'millimetres'}. Each row says below how the plan reads it.
          {part?.fitKind && ' This part also carries a fit spec from the shop catalog; its figures count as attributes and need not be typed here.'}
        </Typography.Paragraph>
        <Form.List name="attributes">
          {(fields, { add, remove }) => (
            <>
              {fields.map((field) => (
                <Row key={field.key} gutter={8}>
                  <Col xs={11}>
                    <Form.Item name={[field.name, 'name']} rules={[{ required: true, whitespace: true, message: 'Name the attribute' }]}>
                      <AutoComplete
                        aria-label="Attribute name"
                        placeholder="sump position"
                        options={ATTRIBUTE_OPTIONS}
                        filterOption={(input, option) => String(option?.value ?? '').toLowerCase().includes(input.toLowerCase())}
                      />
                    </Form.Item>
                  </Col>
                  <Col xs={11}>
                    <AttributeValueItem form={form} index={field.name} />
                  </Col>
                  <Col xs={2}>
                    <Button type="link" danger aria-label="Remove attribute" onClick={() => remove(field.name)} style={{ paddingInline: 0 }}>
                      ✕
                    </Button>
                  </Col>
                </Row>
              ))}
              <Button onClick={() => add({})} style={{ marginBottom: 16 }}>
                Add attribute
              </Button>
            </>
          )}
        </Form.List>

        <Divider titlePlacement="start">Rules between parts</Divider>
        {skuList('requiresSkus', 'Requires', 'The plan adds one of these SKUs whenever it picks this part.')}
        {skuList('excludesSkus', 'Excludes', 'Never in the same plan as this part.')}
        {skuList('replacesSkus', 'Replaces', 'SKUs this part supersedes; they are not offered while it is in the catalog.')}
      </Form>
      {part && <StockSection part={part} />}
    </FormDrawer>
  );
}
