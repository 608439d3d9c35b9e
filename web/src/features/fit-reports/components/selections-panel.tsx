import { Col, Row, Select, Typography } from 'antd';
import type { ReactNode } from 'react';

export type SelectionOption = { value: string; label: string };

export type SelectionSlot = {
  key: string;
  label: string;
  value: string | null;
  options: SelectionOption[];
  loading?: boolean;
  disabled?: boolean;
  placeholder?: string;
  onChange: (value: string | null) => void;
  onSearch?: (text: string) => void;
  help?: string;
  /** Shown under the picker when it has nothing to offer (where to add that kind). */
  emptyHelp?: ReactNode;
};

export type SelectionsPanelProps = { slots: SelectionSlot[]; saving?: boolean };

/** The parts the fit check is run with, each picked from the shop catalog. */
export function SelectionsPanel({ slots, saving }: SelectionsPanelProps) {
  return (
    <Row gutter={[16, 12]} className="fit-selections" aria-busy={saving || undefined}>
      {slots.map((slot) => {
        const id = `fit-selection-${slot.key}`;
        const known = slot.value === null || slot.options.some((o) => o.value === slot.value);
        const options = known ? slot.options : [{ value: slot.value as string, label: slot.value as string }, ...slot.options];
        return (
          <Col key={slot.key} xs={24} md={12} xl={8} data-testid={`selection-${slot.key}`}>
            <label htmlFor={id} style={{ display: 'block', fontWeight: 600, marginBottom: 4 }}>
              {slot.label}
            </label>
            <Select
              id={id}
              aria-label={slot.label}
              style={{ width: '100%' }}
              value={slot.value ?? undefined}
              options={options}
              loading={slot.loading}
              disabled={slot.disabled}
              allowClear
              showSearch={slot.onSearch ? { filterOption: false, onSearch: slot.onSearch } : { optionFilterProp: 'label' }}
              placeholder={slot.placeholder ?? 'None chosen'}
              notFoundContent={slot.options.length === 0 ? `Nothing to choose yet` : undefined}
              onChange={(v: string | undefined) => slot.onChange(v ?? null)}
            />
            {slot.emptyHelp && !slot.loading && slot.options.length === 0 && (
              <Typography.Text type="secondary" style={{ fontSize: 12, display: 'block' }} data-testid={`empty-${slot.key}`}>
                {slot.emptyHelp}
              </Typography.Text>
            )}
            {slot.help && (
              <Typography.Text type="secondary" style={{ fontSize: 12 }}>
                {slot.help}
              </Typography.Text>
            )}
          </Col>
        );
      })}
    </Row>
  );
}
