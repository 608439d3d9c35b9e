import type { Rule } from 'antd/es/form';

export const PASSWORD_MIN_LENGTH = 8;

export const passwordRules: Rule[] = [
  { required: true, message: 'Choose a password' },
  { min: PASSWORD_MIN_LENGTH, message: `Use at least ${PASSWORD_MIN_LENGTH} characters` },
  { max: 72, message: 'Use at most 72 characters' },
];

export const emailRules: Rule[] = [
  { required: true, message: 'Enter your email address' },
  { type: 'email', message: 'Enter a valid email address, like name@example.com' },
];

export const confirmPasswordRules = (field = 'password'): Rule[] => [
  { required: true, message: 'Repeat the password' },
  ({ getFieldValue }) => ({
    validator: (_, value) =>
      !value || getFieldValue(field) === value
        ? Promise.resolve()
        : Promise.reject(new Error('The two passwords do not match')),
  }),
];
