import { moneySign } from '@swapwright/shared';
import { Button, Card, Col, Form, Input, Radio, Row, Select, Typography } from 'antd';
import { useEffect, useMemo } from 'react';
import { FormErrorAlert } from '@/components/form-error-alert';
import { notifySuccess } from '@/lib/notifier';
import { useUpdateShop } from '../api/update-shop';
import { timeZoneMatches, timeZoneOptions } from '../time-zones';
import type { Shop, UpdateShopInput } from '../types';
import { NumberField } from '@/components/number-field';

export type ShopSettingsFormProps = { shop: Shop; canEdit: boolean };

type ShopSettingsValues = Required<Omit<UpdateShopInput, 'currency'>>;

export function ShopSettingsForm({ shop, canEdit }: ShopSettingsFormProps) {
  const [form] = Form.useForm<ShopSettingsValues>();
  const update = useUpdateShop({ onSuccess: () => notifySuccess({ title: 'Shop settings saved' }) });

  useEffect(() => {
    form.setFieldsValue({
      name: shop.name,
      unitSystem: shop.unitSystem,
      laborRatePerHour: shop.laborRatePerHour,
      taxRatePercent: shop.taxRatePercent,
      shopSuppliesPercent: shop.shopSuppliesPercent,
      timeZone: shop.timeZone,
    });
  }, [shop, form]);
  const zones = useMemo(() => timeZoneOptions(shop.timeZone), [shop.timeZone]);

  const submit = (v: ShopSettingsValues) => {
    const changes: UpdateShopInput = {};
    (Object.keys(v) as (keyof ShopSettingsValues)[]).forEach((k) => {
      const value = k === 'name' ? v.name.trim() : v[k];
      if (value !== shop[k]) (changes as Record<string, unknown>)[k] = value;
    });
    if (Object.keys(changes).length === 0) {
      notifySuccess({ title: 'Nothing changed' });
      return;
    }
    update.mutate(changes);
  };

  const money = { prefix: moneySign(shop.currency) };

  return (
    <Form<ShopSettingsValues>
      form={form}
      layout="vertical"
      onFinish={submit}
      disabled={!canEdit}
      aria-label="Shop settings"
      style={{ maxWidth: 720 }}
    >
      <FormErrorAlert error={update.error} />
      <Card title="Shop" style={{ marginBottom: 16 }}>
        <Form.Item
          label="Shop name"
          name="name"
          rules={[
            { required: true, whitespace: true, message: 'The shop needs a name' },
            { max: 120, message: 'Keep the name under 120 characters' },
          ]}
        >
          <Input />
        </Form.Item>
        <Form.Item
          label="Units"
          name="unitSystem"
          extra="How lengths show for everyone in the shop. Each person can switch for themselves in the top bar; figures are always stored in millimetres."
        >
          <Radio.Group
            optionType="button"
            buttonStyle="solid"
            options={[
              { value: 'in', label: 'Inches' },
              { value: 'mm', label: 'Millimetres' },
            ]}
          />
        </Form.Item>
        <Form.Item
          label="Time zone for quote dates"
          name="timeZone"
          extra="Quotes are dated by the shop's own day in this zone: the day a quote is issued, the first day it may be valid until, and the day after its last valid day, when it lapses."
          rules={[{ required: true, message: 'Choose the time zone the shop works in' }]}
        >
          <Select showSearch options={zones} filterOption={timeZoneMatches} placeholder="Type a city, e.g. Denver" style={{ maxWidth: 360 }} />
        </Form.Item>
      </Card>
      <Card title="Rates for quotes" style={{ marginBottom: 16 }}>
        <Row gutter={16}>
          <Col xs={24} sm={8}>
            <NumberField label="Labor rate per hour" name="laborRatePerHour" example="135.00" required="Enter the labor rate" min={0} max={10000} rangeMessage="Between 0 and 10,000" precision={2} step={5} {...money} />
          </Col>
          <Col xs={24} sm={8}>
            <NumberField label="Sales tax" name="taxRatePercent" example="8.25" extra="On parts." required="Enter the tax rate (0 if none)" min={0} max={100} rangeMessage="Between 0 and 100 %" precision={2} step={0.25} suffix="%" />
          </Col>
          <Col xs={24} sm={8}>
            <NumberField label="Shop supplies" name="shopSuppliesPercent" example="5" extra="Added to quotes for consumables." required="Enter the shop supplies share (0 if none)" min={0} max={50} rangeMessage="Between 0 and 50 %" precision={2} step={0.5} suffix="%" />
          </Col>
        </Row>
        <Typography.Text type="secondary">
          Currency: {shop.currency}. Check the tax rate against your local rules; quotes use it as entered. Quotes still
          being written (and budgets of your own builds not yet started) take new rates when you save; a quote already
          sent keeps the rates it was sent with.
        </Typography.Text>
      </Card>
      {canEdit && (
        <Button type="primary" htmlType="submit" loading={update.isPending}>
          Save settings
        </Button>
      )}
    </Form>
  );
}
