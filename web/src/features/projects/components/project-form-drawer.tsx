import { moneySign } from '@swapwright/shared';
import { App, Button, Col, Drawer, Flex, Form, Input, Radio, Row, Select } from 'antd';
import { BoundedNumberInput, plainNumberRule } from '@/components/bounded-number-input';
import { useEffect } from 'react';
import { FormErrorAlert } from '@/components/form-error-alert';
import { notifySuccess } from '@/lib/notifier';
import { hpToKw, kwToHp } from '@/lib/units';
import { TARGET_POWER_BOUNDS } from '../lib/target-power';
import type { UnitSystem } from '@swapwright/shared';
import { useCreateProject } from '../api/create-project';
import { useUpdateProject } from '../api/update-project';
import { useLabels } from '../project-labels';
import { projectUses, type Project, type ProjectGoals, type ProjectUse } from '../types';
import { useDrawerSize } from '@/hooks/use-drawer-size';

export type CustomerOption = { value: string; label: string };

/** The API takes budgets up to 100,000,000.00 in the shop currency. */
const MAX_BUDGET = 100_000_000;

export type ProjectFormDrawerProps = {
  open: boolean;
  project?: Project | null;
  onClose: () => void;
  onSaved?: (project: Project) => void;
  /** Customers to choose from; the route supplies them (projects do not load customers themselves). */
  customerOptions: CustomerOption[];
  customersLoading?: boolean;
  onCustomerSearch?: (text: string) => void;
  onAddCustomer?: () => void;
  /** A customer just added from "Customer not listed? Add one": picked in the Customer field, by name before the list refetches. */
  addedCustomer?: CustomerOption | null;
  unitSystem?: UnitSystem;
  currency?: string;
  /** Prefill the customer when opened from a customer. */
  defaultCustomerId?: string;
  /** True when the shop has no customer besides the signed-in person: a new project then starts as their own truck. */
  noOtherCustomers?: boolean;
};

/** Whose vehicle a new project is: a customer's, or the signed-in person's own (filed under their own record). */
export type ProjectOwner = 'customer' | 'self';
const ownerChoices: { value: ProjectOwner; label: string }[] = [
  { value: 'customer', label: 'For a customer' },
  { value: 'self', label: 'My own truck' },
];

type ProjectFormValues = {
  owner: ProjectOwner;
  title: string;
  customerId?: string;
  vehicleDescription: string;
  use: ProjectUse;
  targetPower?: number | null;
  revLimitRpm?: number | null;
  budget?: number | null;
};

export function ProjectFormDrawer({
  open,
  project,
  onClose,
  onSaved,
  customerOptions,
  customersLoading,
  onCustomerSearch,
  onAddCustomer,
  addedCustomer,
  unitSystem = 'in',
  currency = 'USD',
  defaultCustomerId,
  noOtherCustomers,
}: ProjectFormDrawerProps) {
  const [form] = Form.useForm<ProjectFormValues>();
  const { modal } = App.useApp();
  const drawerSize = useDrawerSize(520);
  const isEdit = Boolean(project);
  const powerUnit = unitSystem === 'in' ? 'hp' : 'kW';
  const power = TARGET_POWER_BOUNDS[unitSystem === 'in' ? 'hp' : 'kW'];
  const done = (saved: Project) => {
    notifySuccess({ title: isEdit ? 'Project saved' : 'Project opened', description: saved.title });
    onSaved?.(saved);
    onClose();
  };
  /** Cancel, Esc and the close button ask before throwing away what was typed. */
  const requestClose = () => {
    if (!form.isFieldsTouched()) return onClose();
    modal.confirm({
      title: 'Discard what you typed?',
      content: isEdit ? 'The changes to this project are not saved.' : 'The project is not opened yet.',
      okText: 'Discard',
      okButtonProps: { danger: true },
      cancelText: 'Keep editing',
      onOk: onClose,
    });
  };
  const create = useCreateProject({ onSuccess: done });
  const update = useUpdateProject({ onSuccess: done });
  const mutation = isEdit ? update : create;
  const owner = Form.useWatch('owner', form);
  const forSelf = !isEdit && owner === 'self';
  const startOwner: ProjectOwner = !defaultCustomerId && noOtherCustomers ? 'self' : 'customer';

  useEffect(() => {
    if (!open) return;
    create.reset();
    update.reset();
    const g = project?.goals;
    form.setFieldsValue({
      owner: startOwner,
      title: project?.title ?? '',
      customerId: project?.customerId ?? defaultCustomerId,
      vehicleDescription: project?.vehicleDescription ?? '',
      use: g?.use ?? 'street',
      targetPower: g?.targetPowerKw != null ? Math.round(unitSystem === 'in' ? kwToHp(g.targetPowerKw) : g.targetPowerKw) : null,
      revLimitRpm: g?.revLimitRpm ?? null,
      budget: g?.budgetCents != null ? g.budgetCents / 100 : null,
    });
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [open, project]);

  // Whether the shop has customers may arrive after the drawer opened; follow it until the person picks themselves.
  useEffect(() => {
    if (open && !isEdit && !form.isFieldTouched('owner')) form.setFieldValue('owner', startOwner);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [open, isEdit, startOwner]);

  useEffect(() => {
    if (!open || !addedCustomer) return;
    form.setFieldValue('owner', 'customer');
    form.setFields([{ name: 'customerId', value: addedCustomer.value, errors: [] }]);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [open, addedCustomer]);

  const submit = (v: ProjectFormValues) => {
    const goals: ProjectGoals = {
      use: v.use,
      targetPowerKw:
        v.targetPower != null ? Math.round((unitSystem === 'in' ? hpToKw(v.targetPower) : v.targetPower) * 10) / 10 : null,
      revLimitRpm: v.revLimitRpm ?? null,
      budgetCents: v.budget != null ? Math.round(v.budget * 100) : null,
    };
    const base = {
      title: v.title.trim(),
      vehicleDescription: v.vehicleDescription.trim(),
      goals,
    };
    if (project) update.mutate({ id: project.id, changes: { ...base, customerId: v.customerId } });
    else if (v.owner === 'self') create.mutate({ ...base, forMyself: true });
    else create.mutate({ ...base, customerId: v.customerId });
  };

  // Keep the current and the just-added customer selectable (by name) even when the search result does not include them.
  const kept = [project ? { value: project.customerId, label: project.customer.name } : null, addedCustomer ?? null];
  const options = [...kept.filter((o): o is CustomerOption => o !== null && !customerOptions.some((c) => c.value === o.value)), ...customerOptions];

  return (
    <Drawer
      open={open}
      onClose={requestClose}
      title={isEdit ? `Edit ${project?.title}` : 'New project'}
      size={drawerSize}
      destroyOnHidden
      footer={
        <Flex justify="flex-end" gap={8}>
          <Button onClick={requestClose}>Cancel</Button>
          <Button type="primary" loading={mutation.isPending} onClick={() => form.submit()}>
            {isEdit ? 'Save project' : 'Open project'}
          </Button>
        </Flex>
      }
    >
      <Form<ProjectFormValues> form={form} layout="vertical" onFinish={submit} aria-label="Project" requiredMark="optional">
        <FormErrorAlert error={mutation.error} />
        <Form.Item
          label="Swap for"
          name="owner"
          hidden={isEdit}
          rules={[{ required: true, message: 'Choose whose vehicle this swap is for' }]}
          extra={forSelf ? <span data-testid="own-truck-note">Filed under your own name in the shop; no customer to set up.</span> : undefined}
        >
          <Radio.Group optionType="button" buttonStyle="solid" options={ownerChoices} aria-label="Swap for" />
        </Form.Item>
        <Form.Item
          label="Project title"
          name="title"
          rules={[
            { required: true, whitespace: true, message: 'Give the project a title' },
            { max: 160, message: 'Keep the title under 160 characters' },
          ]}
        >
          <Input placeholder="Ridgeback V8 tow build" autoFocus />
        </Form.Item>
        {!forSelf && (
          <Form.Item
            label="Customer"
            name="customerId"
            rules={[{ required: true, message: 'Choose the customer this swap is for' }]}
            extra={
              onAddCustomer ? (
                <Button type="link" size="small" style={{ padding: 0 }} onClick={onAddCustomer}>
                  Customer not listed? Add one
                </Button>
              ) : undefined
            }
          >
            <Select
              showSearch={{ filterOption: false, onSearch: onCustomerSearch }}
              options={options}
              loading={customersLoading}
              placeholder="Search customers"
              notFoundContent={customersLoading ? 'Looking…' : 'No customer found'}
              aria-label="Customer"
            />
          </Form.Item>
        )}
        <Form.Item
          label="Vehicle"
          name="vehicleDescription"
          extra={forSelf ? 'Year, make, model and body of your truck.' : 'Year, make, model and body as the customer describes it.'}
          rules={[
            { required: true, whitespace: true, message: 'Describe the vehicle (the chassis getting the engine)' },
            { max: 200, message: 'Keep the description under 200 characters' },
          ]}
        >
          <Input placeholder="1978 Harlan Ridgeback half-ton" />
        </Form.Item>
        <Form.Item label="Main use" name="use" rules={[{ required: true, message: 'Choose how the vehicle will be used' }]}>
          <Radio.Group optionType="button" buttonStyle="solid" options={projectUses.map((u) => ({ value: u, label: useLabels[u] }))} />
        </Form.Item>
        <Row gutter={12}>
          <Col span={12}>
            <Form.Item
              label={`Target power (${powerUnit})`}
              validateFirst
              name="targetPower"
              rules={[plainNumberRule('Target power', `350`), { type: 'number', min: power.min, max: power.max, message: power.message }]}
            >
              <BoundedNumberInput style={{ width: '100%' }} min={power.min} max={power.max} precision={0} suffix={powerUnit} aria-label="Target power" />
            </Form.Item>
          </Col>
          <Col span={12}>
            <Form.Item
              label="Planned rev limit"
              validateFirst
              name="revLimitRpm"
              rules={[plainNumberRule('Planned rev limit', '5500'), { type: 'number', min: 1000, max: 12000, message: 'Between 1,000 and 12,000 rpm' }]}
            >
              <BoundedNumberInput style={{ width: '100%' }} min={1000} max={12000} step={100} precision={0} suffix="rpm" aria-label="Planned rev limit" />
            </Form.Item>
          </Col>
        </Row>
        <Form.Item
          label="Budget"
          validateFirst
          name="budget"
          rules={[
            plainNumberRule('Budget', '18,500'),
            { type: 'number', min: 0, message: 'The budget cannot be negative' },
            { type: 'number', max: MAX_BUDGET, message: `Keep the budget at or under ${MAX_BUDGET.toLocaleString('en-US')}` },
          ]}
        >
          <BoundedNumberInput
            style={{ width: '100%' }}
            min={0}
            max={MAX_BUDGET}
            step={500}
            precision={2}
            prefix={moneySign(currency)}
            aria-label="Budget"
          />
        </Form.Item>
      </Form>
    </Drawer>
  );
}
