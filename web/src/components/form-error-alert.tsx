import { Alert } from 'antd';
import { getApiErrorBody, getErrorMessage } from '@/lib/api-error';

export type FormErrorAlertProps = {
  error: unknown;
  /** Replace the server's sentence for known codes, e.g. bad credentials. */
  messages?: Partial<Record<string, string>>;
  /** Rewrites the server's sentences (title and details) into the form's own words. */
  translate?: (text: string) => string;
};

export function FormErrorAlert({ error, messages, translate = (t) => t }: FormErrorAlertProps) {
  if (!error) return null;
  const body = getApiErrorBody(error);
  const title = translate((body && messages?.[body.code]) || getErrorMessage(error));
  const details = body?.details?.map(translate).filter((d) => d !== title) ?? [];
  return (
    <Alert
      type="error"
      showIcon
      role="alert"
      title={title}
      description={
        details.length > 0 ? (
          <ul style={{ margin: 0, paddingInlineStart: 18 }}>
            {details.map((d) => (
              <li key={d}>{d}</li>
            ))}
          </ul>
        ) : undefined
      }
      style={{ marginBottom: 16 }}
    />
  );
}
