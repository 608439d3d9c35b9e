import { Button, Form, Input } from 'antd';
import type { Session } from '@/lib/api-types';
import { FormErrorAlert } from '@/components/form-error-alert';
import { useAcceptInvitation } from '../api/accept-invitation';
import { confirmPasswordRules, passwordRules } from './password-rules';

export type AcceptInviteFormProps = { token: string; onAccepted?: (session: Session) => void };

export function AcceptInviteForm({ token, onAccepted }: AcceptInviteFormProps) {
  const accept = useAcceptInvitation({ onSuccess: onAccepted });

  return (
    <Form<{ name: string; password: string; confirm: string }>
      layout="vertical"
      requiredMark={false}
      aria-label="Accept invitation"
      onFinish={({ name, password }) => accept.mutate({ token, name: name.trim(), password })}
    >
      <FormErrorAlert
        error={accept.error}
        messages={{ invitation_invalid: 'This invitation has expired or was already used. Ask the shop owner to send a new one.' }}
      />
      <Form.Item label="Your name" name="name" rules={[{ required: true, whitespace: true, message: 'Enter your name' }, { max: 120 }]}>
        <Input autoComplete="name" autoFocus />
      </Form.Item>
      <Form.Item label="Password" name="password" rules={passwordRules} hasFeedback>
        <Input.Password autoComplete="new-password" />
      </Form.Item>
      <Form.Item label="Repeat password" name="confirm" dependencies={['password']} rules={confirmPasswordRules()} hasFeedback>
        <Input.Password autoComplete="new-password" />
      </Form.Item>
      <Button type="primary" htmlType="submit" block loading={accept.isPending}>
        Join the shop
      </Button>
    </Form>
  );
}
