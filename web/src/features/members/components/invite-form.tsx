import { Button, Form, Input, Select } from 'antd';
import { FormErrorAlert } from '@/components/form-error-alert';
import { notifySuccess } from '@/lib/notifier';
import { ROLES as roles, type Role } from '@swapwright/shared';
import { useCreateInvitation } from '../api/create-invitation';
import { roleHints, roleLabels, type CreateInvitationInput } from '../types';

export type InviteCustomerOption = { value: string; label: string };

export type InviteFormProps = {
  /** Customers an invitation with role "customer" can be linked to; supplied by the route. */
  customerOptions: InviteCustomerOption[];
  customersLoading?: boolean;
  onCustomerSearch?: (text: string) => void;
};

export function InviteForm({ customerOptions, customersLoading, onCustomerSearch }: InviteFormProps) {
  const [form] = Form.useForm<CreateInvitationInput>();
  const role = Form.useWatch('role', form);
  const invite = useCreateInvitation({
    onSuccess: (inv) => {
      notifySuccess({ title: 'Invitation sent', description: `${inv.email} gets a link to join as ${roleLabels[inv.role].toLowerCase()}.` });
      form.resetFields();
    },
  });

  return (
    <Form<CreateInvitationInput>
      form={form}
      layout="vertical"
      aria-label="Invite a member"
      onFinish={(v) =>
        invite.mutate({ email: v.email.trim(), role: v.role, ...(v.role === 'customer' && v.customerId ? { customerId: v.customerId } : {}) })
      }
    >
      <FormErrorAlert error={invite.error} />
      <Form.Item
        label="Email"
        name="email"
        rules={[
          { required: true, message: 'Enter the email to send the invitation to' },
          { type: 'email', message: 'Enter a valid email address' },
        ]}
      >
        <Input type="email" placeholder="name@example.com" />
      </Form.Item>
      <Form.Item label="Role" name="role" rules={[{ required: true, message: 'Choose what this person does in the shop' }]} extra={role ? roleHints[role] : undefined}>
        <Select<Role>
          aria-label="Role"
          placeholder="Choose a role"
          options={roles.filter((r) => r !== 'owner').map((r) => ({ value: r, label: roleLabels[r] }))}
        />
      </Form.Item>
      {role === 'customer' && (
        <Form.Item
          label="Customer record"
          name="customerId"
          rules={[{ required: true, message: 'Choose which customer this person is' }]}
          extra="They will see only this customer’s projects."
        >
          <Select
            showSearch={{ filterOption: false, onSearch: onCustomerSearch }}
            options={customerOptions}
            loading={customersLoading}
            notFoundContent={customersLoading ? 'Looking…' : 'No customer found'}
            placeholder="Search customers"
            aria-label="Customer record"
          />
        </Form.Item>
      )}
      <Button type="primary" htmlType="submit" loading={invite.isPending}>
        Send invitation
      </Button>
    </Form>
  );
}
