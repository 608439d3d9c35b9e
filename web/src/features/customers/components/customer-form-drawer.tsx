import { Button, Drawer, Flex, Form, Input } from 'antd';
import { useEffect } from 'react';
import { FormErrorAlert } from '@/components/form-error-alert';
import { notifySuccess } from '@/lib/notifier';
import { useCreateCustomer } from '../api/create-customer';
import { useUpdateCustomer } from '../api/update-customer';
import type { Customer, CustomerInput } from '../types';
import { useDrawerSize } from '@/hooks/use-drawer-size';
import { phoneProblem } from '@/lib/phone';

export type CustomerFormDrawerProps = {
  open: boolean;
  /** Edit this customer; create a new one when absent. */
  customer?: Customer | null;
  onClose: () => void;
  onSaved?: (customer: Customer) => void;
};

function clean(values: CustomerInput): CustomerInput {
  const trim = (v?: string | null) => (v?.trim() ? v.trim() : undefined);
  return { name: values.name.trim(), email: trim(values.email), phone: trim(values.phone), notes: trim(values.notes) };
}

export function CustomerFormDrawer({ open, customer, onClose, onSaved }: CustomerFormDrawerProps) {
  const [form] = Form.useForm<CustomerInput>();
  const drawerSize = useDrawerSize(460);
  const isEdit = Boolean(customer);
  const done = (saved: Customer) => {
    notifySuccess({ title: isEdit ? 'Customer saved' : 'Customer added', description: saved.name });
    onSaved?.(saved);
    onClose();
  };
  const create = useCreateCustomer({ onSuccess: done });
  const update = useUpdateCustomer({ onSuccess: done });
  const mutation = isEdit ? update : create;

  useEffect(() => {
    if (!open) return;
    create.reset();
    update.reset();
    form.setFieldsValue({
      name: customer?.name ?? '',
      email: customer?.email ?? '',
      phone: customer?.phone ?? '',
      notes: customer?.notes ?? '',
    });
    // reset only when the drawer opens for a (new) record
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [open, customer]);

  const submit = (values: CustomerInput) => {
    const input = clean(values);
    if (customer) update.mutate({ id: customer.id, changes: input });
    else create.mutate(input);
  };

  return (
    <Drawer
      open={open}
      onClose={onClose}
      title={isEdit ? `Edit ${customer?.name}` : 'New customer'}
      size={drawerSize}
      destroyOnHidden
      footer={
        <Flex justify="flex-end" gap={8}>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="primary" loading={mutation.isPending} onClick={() => form.submit()}>
            {isEdit ? 'Save customer' : 'Add customer'}
          </Button>
        </Flex>
      }
    >
      <Form<CustomerInput> form={form} layout="vertical" onFinish={submit} aria-label="Customer" requiredMark="optional">
        <FormErrorAlert error={mutation.error} />
        <Form.Item
          label="Name"
          name="name"
          rules={[
            { required: true, whitespace: true, message: 'Enter the customer’s name' },
            { max: 120, message: 'Keep the name under 120 characters' },
          ]}
        >
          <Input placeholder="Merrin Tolland" autoFocus />
        </Form.Item>
        <Form.Item
          label="Email"
          name="email"
          rules={[{ type: 'email', message: 'Enter a valid email address' }, { max: 254 }]}
          extra={customer?.ownRecord ? undefined : 'Needed to invite them to follow their project.'}
        >
          <Input type="email" placeholder="merrin@example.com" />
        </Form.Item>
        <Form.Item
          label="Phone"
          name="phone"
          rules={[
            { max: 40, message: 'Keep the phone under 40 characters' },
            { pattern: /^[0-9+()\-.\s x]*$/i, message: 'Use digits, spaces and + ( ) - . only' },
            { validator: async (_: unknown, v: unknown) => { const problem = phoneProblem(typeof v === 'string' ? v : ''); if (problem) throw new Error(problem); } },
          ]}
        >
          <Input type="tel" placeholder="555-0142" />
        </Form.Item>
        <Form.Item label="Notes" name="notes" rules={[{ max: 2000, message: 'Keep notes under 2000 characters' }]}>
          <Input.TextArea rows={4} placeholder="How they prefer to be reached, drop-off dates…" showCount maxLength={2000} />
        </Form.Item>
      </Form>
    </Drawer>
  );
}
