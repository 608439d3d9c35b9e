import { moneySign } from '@swapwright/shared';
import { Button, Card, Col, Form, Input, Row, Typography } from 'antd';
import { useEffect } from 'react';
import { FormErrorAlert } from '@/components/form-error-alert';
import { ErrorState, LoadingState } from '@/components/query-state';
import { notifySuccess } from '@/lib/notifier';
import { useQuoteSettings } from '../api/get-quote-settings';
import { useUpdateQuoteSettings } from '../api/update-quote-settings';
import type { QuoteSettings, UpdateQuoteSettingsInput } from '../types';
import { NumberField } from '@/components/number-field';

export type QuoteTermsFormProps = { canEdit: boolean; currency?: string };

/** The form's figures: the supplies cap in whole currency units (cents on the wire), empty for no cap. */
type QuoteTermsValues = Omit<QuoteSettings, 'suppliesCapCents'> & { suppliesCap: number | null };

const toValues = (s: QuoteSettings): QuoteTermsValues => ({
  laborTaxPercent: s.laborTaxPercent,
  suppliesCap: s.suppliesCapCents === null ? null : s.suppliesCapCents / 100,
  depositPercent: s.depositPercent,
  validityDays: s.validityDays,
  defaultMarkupPercent: s.defaultMarkupPercent,
  terms: s.terms,
});

/** Only what changed, the supplies cap back in cents (an emptied box clears the cap). */
export function quoteTermsChanges(stored: QuoteSettings, v: QuoteTermsValues): UpdateQuoteSettingsInput {
  const changes: UpdateQuoteSettingsInput = {};
  const cap = v.suppliesCap === null || v.suppliesCap === undefined ? null : Math.round(v.suppliesCap * 100);
  if (cap !== stored.suppliesCapCents) changes.suppliesCapCents = cap;
  for (const key of ['laborTaxPercent', 'depositPercent', 'validityDays', 'defaultMarkupPercent'] as const) {
    if (v[key] !== stored[key]) changes[key] = v[key];
  }
  const terms = v.terms.trim();
  if (terms !== stored.terms) changes.terms = terms;
  return changes;
}

/** The shop's terms for every new quote: labor tax, supplies cap, deposit, markup on cost, validity and printed terms. */
export function QuoteTermsForm({ canEdit, currency = 'USD' }: QuoteTermsFormProps) {
  const settings = useQuoteSettings();
  const [form] = Form.useForm<QuoteTermsValues>();
  const update = useUpdateQuoteSettings({ onSuccess: () => notifySuccess({ title: 'Quote terms saved', description: 'New quotes and revisions use them; sent quotes keep theirs.' }) });

  useEffect(() => {
    if (settings.data) form.setFieldsValue(toValues(settings.data));
  }, [settings.data, form]);

  if (settings.isPending) return <LoadingState rows={6} />;
  if (settings.isError) return <ErrorState error={settings.error} onRetry={() => void settings.refetch()} />;
  const stored = settings.data;
  const money = { prefix: moneySign(currency) };

  const submit = (v: QuoteTermsValues) => {
    const changes = quoteTermsChanges(stored, v);
    if (Object.keys(changes).length === 0) {
      notifySuccess({ title: 'Nothing changed' });
      return;
    }
    update.mutate(changes);
  };

  return (
    <Form<QuoteTermsValues> form={form} layout="vertical" onFinish={submit} disabled={!canEdit} aria-label="Quote terms" style={{ maxWidth: 720 }}>
      <Card title="Quote terms" style={{ marginBottom: 16 }}>
        <FormErrorAlert error={update.error} />
        <Row gutter={16}>
          <Col xs={24} sm={8}>
            <NumberField label="Tax on labor" name="laborTaxPercent" example="8.25" extra="On labor and shop supplies; 0 where labor is not taxed." required="Enter the labor tax rate (0 if none)" min={0} max={100} rangeMessage="Between 0 and 100 %" precision={2} step={0.25} suffix="%" />
          </Col>
          <Col xs={24} sm={8}>
            <NumberField label="Shop supplies cap" name="suppliesCap" example="75.00" extra="Most shop supplies a quote charges; leave empty for no cap." min={0} max={1_000_000} rangeMessage={`Between 0 and 1,000,000 ${currency}`} precision={2} step={5} {...money} />
          </Col>
          <Col xs={24} sm={8}>
            <NumberField label="Deposit" name="depositPercent" example="30" extra="Share of the quote total asked up front." required="Enter the deposit share (0 for none)" min={0} max={100} rangeMessage="Between 0 and 100 %" precision={2} step={5} suffix="%" />
          </Col>
          <Col xs={24} sm={8}>
            <NumberField label="Markup on part cost" name="defaultMarkupPercent" example="35" extra="For parts priced from cost." required="Enter the markup (0 to sell at cost)" min={0} max={1000} rangeMessage="Between 0 and 1,000 %" precision={2} step={5} suffix="%" />
          </Col>
          <Col xs={24} sm={8}>
            <NumberField label="Quote valid for" name="validityDays" example="30" required="Enter how many days a quote holds" min={1} max={365} rangeMessage="Between 1 and 365 days" precision={0} step={1} suffix="days" />
          </Col>
        </Row>
        <Form.Item
          label="Terms printed on the quote"
          name="terms"
          rules={[
            { required: true, whitespace: true, message: 'Write the terms the customer agrees to' },
            { max: 4000, message: 'Keep the terms under 4,000 characters' },
          ]}
        >
          <Input.TextArea autoSize={{ minRows: 3, maxRows: 10 }} showCount maxLength={4000} />
        </Form.Item>
        <Typography.Paragraph type="secondary">
          New quotes and revisions use these, and quotes still being written take a new tax on labor or supplies cap when
          you save; a sent quote keeps the terms it was sent with. Check the tax rates against your local rules.
        </Typography.Paragraph>
        {canEdit && (
          <Button type="primary" htmlType="submit" loading={update.isPending}>
            Save quote terms
          </Button>
        )}
      </Card>
    </Form>
  );
}
