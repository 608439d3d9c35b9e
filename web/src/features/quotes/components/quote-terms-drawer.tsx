import { moneySign } from '@swapwright/shared';
import { Col, Form, Input, Row } from 'antd';
import { useEffect } from 'react';
import { FormDrawer } from '@/components/form-drawer';
import { FormErrorAlert } from '@/components/form-error-alert';
import type { UpdateQuoteBody } from '../api/update-quote';
import { toCents } from '../quote-line-input';
import { firstValidDay, validUntilRule } from '../quote-validity';
import type { Quote } from '../types';
import { NumberField } from '@/components/number-field';
import { ChoiceField } from './quote-fields';

type Revision = Quote['revision'];

type QuoteTermsFormValues = {
  discountKind: Revision['discountKind'];
  discountPercent?: number | null;
  discountAmount?: number | null;
  depositKind: Revision['depositKind'];
  depositPercent?: number | null;
  depositAmount?: number | null;
  validUntil: string;
  notes?: string;
};

export interface QuoteTermsDrawerProps {
  open: boolean;
  revision: Revision;
  /** The shop's IANA time zone: the last valid day is the shop's today or later. */
  timeZone: string;
  saving: boolean;
  error: unknown;
  onSubmit: (changes: UpdateQuoteBody) => void;
  onClose: () => void;
}

const fromCents = (cents: number | null) => (cents === null ? null : cents / 100);

/** The working revision's discount, deposit, last valid day and notes (shop supplies and tax follow the shop's settings). */
export function QuoteTermsDrawer({ open, revision, timeZone, saving, error, onSubmit, onClose }: QuoteTermsDrawerProps) {
  const [form] = Form.useForm<QuoteTermsFormValues>();
  const discountKind = Form.useWatch('discountKind', form);
  const depositKind = Form.useWatch('depositKind', form);
  useEffect(() => {
    if (!open) return;
    form.setFieldsValue({
      discountKind: revision.discountKind,
      discountPercent: revision.discountPercent,
      discountAmount: fromCents(revision.discountAmountCents),
      depositKind: revision.depositKind,
      depositPercent: revision.depositPercent,
      depositAmount: fromCents(revision.depositAmountCents),
      validUntil: revision.validUntil,
      notes: revision.notes,
    });
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [open, revision]);

  const submit = (v: QuoteTermsFormValues) =>
    onSubmit({
      discount: {
        kind: v.discountKind,
        percent: v.discountKind === 'percent' ? (v.discountPercent ?? null) : null,
        amountCents: v.discountKind === 'fixed' && v.discountAmount != null ? toCents(v.discountAmount) : null,
      },
      deposit: {
        kind: v.depositKind,
        percent: v.depositKind === 'percent' ? (v.depositPercent ?? null) : null,
        amountCents: v.depositKind === 'fixed' && v.depositAmount != null ? toCents(v.depositAmount) : null,
      },
      validUntil: v.validUntil,
      notes: v.notes ?? '',
    });

  return (
    <FormDrawer open={open} title="Discount, deposit and validity" width={480} submitLabel="Save" saving={saving} onSubmit={() => form.submit()} onClose={onClose}>
      <Form<QuoteTermsFormValues> form={form} layout="vertical" onFinish={submit} aria-label="Discount, deposit and validity" requiredMark="optional">
        <FormErrorAlert error={error} />
        <ChoiceField
          label="Discount"
          name="discountKind"
          options={[
            { value: 'none', label: 'None' },
            { value: 'percent', label: 'Percent' },
            { value: 'fixed', label: 'Amount' },
          ]}
        />
        {discountKind === 'percent' && (
          <NumberField label="Discount percent" name="discountPercent" required="Enter the percent off" example="5" min={0} max={100} suffix="%" />
        )}
        {discountKind === 'fixed' && (
          <NumberField label="Discount amount" name="discountAmount" required="Enter the amount off" example="50.00" min={0} precision={2} prefix={moneySign(revision.currency)} />
        )}
        <ChoiceField
          label="Deposit"
          name="depositKind"
          options={[
            { value: 'percent', label: 'Percent of the total' },
            { value: 'fixed', label: 'Amount' },
          ]}
        />
        <Row gutter={12}>
          <Col span={12}>
            {depositKind === 'fixed' ? (
              <NumberField label="Deposit amount" name="depositAmount" required="Enter the deposit" example="500.00" min={0} precision={2} prefix={moneySign(revision.currency)} />
            ) : (
              <NumberField label="Deposit percent" name="depositPercent" required="Enter the deposit percent" example="30" min={0} max={100} suffix="%" />
            )}
          </Col>
          <Col span={12}>
            <Form.Item label="Valid until" name="validUntil" rules={[{ required: true, message: 'Enter the last day the customer may accept' }, validUntilRule(timeZone)]}>
              {/* the browser's date picker offers no day before the first valid one */}
              <Input type="date" aria-label="Valid until" min={firstValidDay(timeZone)} />
            </Form.Item>
          </Col>
        </Row>
        <Form.Item label="Notes for the customer" name="notes" rules={[{ max: 2000, message: 'Keep the notes under 2,000 characters' }]}>
          <Input.TextArea rows={3} aria-label="Notes for the customer" />
        </Form.Item>
      </Form>
    </FormDrawer>
  );
}
