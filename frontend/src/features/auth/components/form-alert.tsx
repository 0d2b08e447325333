import { Alert } from 'antd';

type FormAlertProps = { message: string | null };

/** The error that belongs to no single field, above the form; screen readers hear it at once. */
export function FormAlert({ message }: FormAlertProps) {
  if (!message) return null;
  return <Alert type="error" showIcon title={message} style={{ marginBottom: 24 }} />;
}
