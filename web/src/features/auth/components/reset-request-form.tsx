import { Button, Form, Input, Result } from 'antd';
import { FormErrorAlert } from '@/components/form-error-alert';
import { useRequestPasswordReset } from '../api/request-password-reset';
import { emailRules } from './password-rules';

export type ResetRequestFormProps = { onBack?: () => void };

export function ResetRequestForm({ onBack }: ResetRequestFormProps) {
  const request = useRequestPasswordReset();

  if (request.isSuccess) {
    return (
      <Result
        status="success"
        title="Check your inbox"
        subTitle="If an account uses that address, a reset link is on its way. The link works once, for 30 minutes."
        extra={onBack && <Button onClick={onBack}>Back to sign in</Button>}
      />
    );
  }

  return (
    <Form<{ email: string }>
      layout="vertical"
      requiredMark={false}
      aria-label="Request a password reset"
      onFinish={({ email }) => request.mutate({ email: email.trim() })}
    >
      <FormErrorAlert error={request.error} />
      <Form.Item label="Email" name="email" rules={emailRules} extra="We will send a link to set a new password.">
        <Input type="email" autoComplete="email" autoFocus />
      </Form.Item>
      <Button type="primary" htmlType="submit" block loading={request.isPending}>
        Send reset link
      </Button>
    </Form>
  );
}
