import { Button, Form, Input, Result } from 'antd';
import { FormErrorAlert } from '@/components/form-error-alert';
import { useConfirmPasswordReset } from '../api/confirm-password-reset';
import { confirmPasswordRules, passwordRules } from './password-rules';

export type ResetConfirmFormProps = { token: string; onDone?: () => void; onRequestNew?: () => void };

export function ResetConfirmForm({ token, onDone, onRequestNew }: ResetConfirmFormProps) {
  const confirm = useConfirmPasswordReset();

  if (confirm.isSuccess) {
    return (
      <Result
        status="success"
        title="Password changed"
        subTitle="Sign in with your new password."
        extra={onDone && <Button type="primary" onClick={onDone}>Sign in</Button>}
      />
    );
  }

  return (
    <Form<{ password: string; confirm: string }>
      layout="vertical"
      requiredMark={false}
      aria-label="Set a new password"
      onFinish={({ password }) => confirm.mutate({ token, password })}
    >
      <FormErrorAlert
        error={confirm.error}
        messages={{ reset_token_invalid: 'This reset link has expired or was already used. Ask for a new one.' }}
      />
      <Form.Item label="New password" name="password" rules={passwordRules} hasFeedback>
        <Input.Password autoComplete="new-password" autoFocus />
      </Form.Item>
      <Form.Item label="Repeat password" name="confirm" dependencies={['password']} rules={confirmPasswordRules()} hasFeedback>
        <Input.Password autoComplete="new-password" />
      </Form.Item>
      <Button type="primary" htmlType="submit" block loading={confirm.isPending}>
        Set new password
      </Button>
      {onRequestNew && (
        <Button type="link" block onClick={onRequestNew} style={{ marginTop: 8 }}>
          Ask for a new link
        </Button>
      )}
    </Form>
  );
}
