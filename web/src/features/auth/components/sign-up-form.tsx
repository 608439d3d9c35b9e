import { Button, Form, Input, Result } from 'antd';
import { FormErrorAlert } from '@/components/form-error-alert';
import { useSignUp } from '../api/sign-up';
import { confirmPasswordRules, emailRules, passwordRules } from './password-rules';

export type SignUpFormProps = { onBack?: () => void };

type SignUpValues = { name: string; shopName: string; email: string; password: string; confirm: string };

export function SignUpForm({ onBack }: SignUpFormProps) {
  const signUp = useSignUp();

  if (signUp.isSuccess) {
    return (
      <Result
        status="success"
        title="Check your e-mail"
        subTitle={`We sent ${signUp.variables.email} a link to finish creating your shop. It works once, for 24 hours. Already have an account with that address? The e-mail says so instead.`}
        extra={onBack && <Button onClick={onBack}>Back to sign in</Button>}
      />
    );
  }

  return (
    <Form<SignUpValues>
      layout="vertical"
      requiredMark={false}
      aria-label="Create your shop"
      onFinish={({ name, shopName, email, password }) =>
        // the new shop dates its quotes by the day where its owner is (the browser's zone; the API takes UTC without one)
        signUp.mutate({ name: name.trim(), shopName: shopName.trim(), email: email.trim(), password, timeZone: Intl.DateTimeFormat().resolvedOptions().timeZone || undefined })
      }
    >
      <FormErrorAlert error={signUp.error} />
      <Form.Item label="Your name" name="name" rules={[{ required: true, whitespace: true, message: 'Enter your name' }, { max: 120 }]}>
        <Input autoComplete="name" placeholder="Merrin Tolland" />
      </Form.Item>
      <Form.Item
        label="Shop or garage name"
        name="shopName"
        extra="Building your own truck? Name your garage; you can invite helpers later."
        rules={[{ required: true, whitespace: true, message: 'Name your shop or garage' }, { max: 120 }]}
      >
        <Input autoComplete="organization" placeholder="Ironbark Swap Works" />
      </Form.Item>
      <Form.Item label="Email" name="email" rules={emailRules}>
        <Input type="email" autoComplete="email" />
      </Form.Item>
      <Form.Item label="Password" name="password" rules={passwordRules} hasFeedback>
        <Input.Password autoComplete="new-password" />
      </Form.Item>
      <Form.Item label="Repeat password" name="confirm" dependencies={['password']} rules={confirmPasswordRules()} hasFeedback>
        <Input.Password autoComplete="new-password" />
      </Form.Item>
      <Button type="primary" htmlType="submit" block loading={signUp.isPending}>
        Create shop
      </Button>
    </Form>
  );
}
