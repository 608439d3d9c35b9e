import { Form, Input } from 'antd';
import { useEffect } from 'react';
import { FormErrorAlert } from '@/components/form-error-alert';
import { FormDrawer } from '@/components/form-drawer';
import { notifySuccess } from '@/lib/notifier';
import { phoneProblem } from '@/lib/phone';
import type { Supplier } from '../api/get-suppliers';
import { type NewSupplier, useSaveSupplier } from '../api/save-supplier';

export type SupplierFormDrawerProps = { open: boolean; supplier?: Supplier | null; onClose: () => void };

type SupplierFormValues = { name: string; contact?: string; email?: string; phone?: string };

/** Create or edit a supplier: name, contact person, e-mail and phone. */
export function SupplierFormDrawer({ open, supplier, onClose }: SupplierFormDrawerProps) {
  const [form] = Form.useForm<SupplierFormValues>();
  const isEdit = Boolean(supplier);
  const save = useSaveSupplier({
    onSuccess: (saved) => {
      notifySuccess({ title: isEdit ? 'Supplier saved' : 'Supplier added', description: saved.name });
      onClose();
    },
  });

  useEffect(() => {
    if (!open) return;
    save.reset();
    form.setFieldsValue({ name: supplier?.name ?? '', contact: supplier?.contact ?? '', email: supplier?.email ?? '', phone: supplier?.phone ?? '' });
    // reset only when the drawer opens for a (new) record
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [open, supplier]);

  const submit = (values: SupplierFormValues) => {
    const text = (v?: string) => v?.trim() || null;
    const body: NewSupplier = { name: values.name.trim(), contact: text(values.contact), email: text(values.email), phone: text(values.phone) };
    save.mutate({ id: supplier?.id, body });
  };

  return (
    <FormDrawer
      open={open}
      onClose={onClose}
      title={isEdit ? `Edit ${supplier?.name}` : 'New supplier'}
      width={460}
      submitLabel={isEdit ? 'Save supplier' : 'Add supplier'}
      saving={save.isPending}
      onSubmit={() => form.submit()}
    >
      <Form<SupplierFormValues> form={form} layout="vertical" onFinish={submit} aria-label="Supplier" requiredMark="optional">
        <FormErrorAlert error={save.error} />
        <Form.Item label="Name" name="name" rules={[{ required: true, whitespace: true, message: 'Enter the supplier’s name' }, { max: 120 }]}>
          <Input placeholder="Brookfield Parts" autoFocus />
        </Form.Item>
        <Form.Item label="Contact" name="contact" rules={[{ max: 120 }]}>
          <Input placeholder="Order desk" />
        </Form.Item>
        <Form.Item label="Email" name="email" rules={[{ type: 'email', message: 'Enter a valid email address' }, { max: 254 }]}>
          <Input type="email" placeholder="orders@example.com" />
        </Form.Item>
        <Form.Item
          label="Phone"
          name="phone"
          rules={[
            { max: 40 },
            { validator: async (_: unknown, v: unknown) => { const problem = phoneProblem(typeof v === 'string' ? v : ''); if (problem) throw new Error(problem); } },
          ]}
        >
          <Input type="tel" placeholder="555-0142" />
        </Form.Item>
      </Form>
    </FormDrawer>
  );
}
