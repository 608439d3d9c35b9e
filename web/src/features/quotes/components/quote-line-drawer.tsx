import { moneySign } from '@swapwright/shared';
import { Col, Form, Input, Row, Select, Typography } from 'antd';
import { useEffect } from 'react';
import { FormDrawer } from '@/components/form-drawer';
import { FormErrorAlert } from '@/components/form-error-alert';
import { useLaborOperations } from '../api/get-labor-operations';
import { hoursRule, lineToForm, MAX_LINE_HOURS, type QuoteLineFormValues } from '../quote-line-input';
import type { QuoteLine } from '../types';
import { NumberField } from '@/components/number-field';
import { ChoiceField } from './quote-fields';

/** Parts are counted whole: 1.5 is refused in words rather than rounded to 2 behind the person's back. */
const WHOLE_QUANTITY = {
  validator: (_rule: unknown, value: unknown) =>
    typeof value !== 'number' || Number.isInteger(value) ? Promise.resolve() : Promise.reject(new Error('Quantity is a whole number of parts (1, 2, 3…)')),
};

export interface QuoteLineDrawerProps {
  open: boolean;
  kind: QuoteLine['kind'];
  /** The line being edited; a new line when absent. */
  line?: QuoteLine;
  currency: string;
  defaultMarkupPercent?: number;
  saving: boolean;
  /** The API's refusal of the last save, shown above the fields. */
  error: unknown;
  onSubmit: (values: QuoteLineFormValues) => void;
  onClose: () => void;
}

const FREE_TEXT = '';

/** What the line will charge, in the shop's words (the quote rule's own steps). */
export function linePriceNote(kind: QuoteLine['kind'], pricing: QuoteLineFormValues['pricing'] | undefined): string {
  const rest = 'The quote’s totals, shop supplies, discount and tax follow when you save.';
  if (kind === 'labor') return `The line charges these hours at the shop’s labor rate, to the nearest cent. ${rest}`;
  if (pricing === 'cost-plus') return `Each part is charged at its cost plus the markup, to the nearest cent, times the quantity. ${rest}`;
  return `The line charges the unit price times the quantity. ${rest}`;
}

/** Adds or edits one line of the working revision: a part (price, or cost and markup) or labor (an operation's book hours, or free text). */
export function QuoteLineDrawer({ open, kind, line, currency, defaultMarkupPercent, saving, error, onSubmit, onClose }: QuoteLineDrawerProps) {
  const [form] = Form.useForm<QuoteLineFormValues>();
  const operations = useLaborOperations(open && kind === 'labor');
  const pricing = Form.useWatch('pricing', form);

  useEffect(() => {
    if (open) form.setFieldsValue(lineToForm(kind, line, defaultMarkupPercent));
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [open, line, kind]);

  const chooseOperation = (id: string) => {
    const operation = operations.data?.find((candidate) => candidate.id === id);
    if (operation) form.setFieldsValue({ description: operation.name, hours: operation.bookHours });
  };

  const what = kind === 'labor' ? 'labor line' : 'parts line';
  return (
    <FormDrawer
      open={open}
      title={line ? `Edit ${what}` : `Add a ${what}`}
      width={480}
      submitLabel={line ? 'Save line' : 'Add line'}
      saving={saving}
      onSubmit={() => form.submit()}
      onClose={onClose}
    >
      <Form<QuoteLineFormValues> form={form} layout="vertical" onFinish={onSubmit} aria-label={line ? `Edit ${what}` : `Add a ${what}`} requiredMark="optional">
        <FormErrorAlert error={error} />
        {kind === 'labor' && (
          <Form.Item label="Operation" name="laborOperationId" extra="Picking one of the shop's operations fills in its book hours.">
            <Select
              aria-label="Operation"
              loading={operations.isLoading}
              onChange={chooseOperation}
              options={[
                { value: FREE_TEXT, label: 'Free text (not from the list)' },
                ...(operations.data ?? []).map((operation) => ({ value: operation.id, label: `${operation.name} · ${operation.bookHours.toFixed(1)} h` })),
              ]}
            />
          </Form.Item>
        )}
        <Form.Item
          label="Description"
          name="description"
          rules={[
            { required: true, whitespace: true, message: 'Describe the line as the customer will read it' },
            { max: 200, message: 'Keep the description under 200 characters' },
          ]}
        >
          <Input aria-label="Description" />
        </Form.Item>
        {kind === 'labor' ? (
          <NumberField
            label="Hours"
            name="hours"
            required="Enter the hours, to a tenth"
            example="3.5"
            min={0}
            max={MAX_LINE_HOURS}
            step={0.1}
            suffix="h"
            rules={[hoursRule]}
          />
        ) : (
          <>
            <Row gutter={12}>
              <Col span={14}>
                <Form.Item label="Part no." name="sku" rules={[{ max: 60, message: 'Keep the part number under 60 characters' }]}>
                  <Input aria-label="Part no." />
                </Form.Item>
              </Col>
              <Col span={10}>
                <NumberField
                  label="Quantity"
                  name="quantity"
                  required="Enter how many"
                  example="2"
                  min={1}
                  max={10000}
                  rangeMessage="Quantity is from 1 to 10,000"
                  rules={[WHOLE_QUANTITY]}
                />
              </Col>
            </Row>
            <ChoiceField
              label="Price each part by"
              name="pricing"
              required="Choose how to price the part"
              options={[
                { value: 'list', label: 'Unit price' },
                { value: 'cost-plus', label: 'Cost and markup' },
              ]}
            />
            {pricing === 'cost-plus' ? (
              <Row gutter={12}>
                <Col span={12}>
                  <NumberField label="Unit cost" name="unitCost" required="Enter what one costs the shop" example="41.37" min={0} precision={2} prefix={moneySign(currency)} />
                </Col>
                <Col span={12}>
                  <NumberField label="Markup" name="markupPercent" required="Enter the markup" example="35" min={0} max={1000} suffix="%" />
                </Col>
              </Row>
            ) : (
              <NumberField label="Unit price" name="unitPrice" required="Enter the price of one" example="289.95" min={0} precision={2} prefix={moneySign(currency)} />
            )}
          </>
        )}
        <Typography.Paragraph type="secondary" style={{ fontSize: 12 }} data-testid="line-price-note">
          {linePriceNote(kind, pricing)}
        </Typography.Paragraph>
      </Form>
    </FormDrawer>
  );
}
