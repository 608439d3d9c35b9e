import { Button, Form } from 'antd';
// The input and password modules alone: the antd Input entry also pulls in TextArea, Search and OTP, which the first
// load (this form) does not use.
import Input from 'antd/es/input/Input';
import Password from 'antd/es/input/Password';
import type { Session } from '@/lib/api-types';
import { FormErrorAlert } from '@/components/form-error-alert';
import { useSignIn, type SignInInput } from '../api/sign-in';
import { emailRules } from './password-rules';

export type SignInFormProps = {
  onSignedIn?: (session: Session) => void;
  initialEmail?: string;
};

export function SignInForm({ onSignedIn, initialEmail }: SignInFormProps) {
  const [form] = Form.useForm<SignInInput>();
  const signIn = useSignIn({ onSuccess: onSignedIn });

  return (
    <Form<SignInInput>
      form={form}
      layout="vertical"
      requiredMark={false}
      initialValues={{ email: initialEmail ?? '' }}
      onFinish={(values) => signIn.mutate({ email: values.email.trim(), password: values.password })}
      aria-label="Sign in"
      data-testid="sign-in-form"
    >
      <FormErrorAlert
        error={signIn.error}
        messages={{ invalid_credentials: 'That email and password do not match an account. Check both and try again.' }}
      />
      <Form.Item label="Email" name="email" rules={emailRules}>
        <Input type="email" autoComplete="email" autoFocus placeholder="you@yourshop.example" />
      </Form.Item>
      <Form.Item label="Password" name="password" rules={[{ required: true, message: 'Enter your password' }]}>
        <Password autoComplete="current-password" />
      </Form.Item>
      <Button type="primary" htmlType="submit" block loading={signIn.isPending}>
        Sign in
      </Button>
    </Form>
  );
}
