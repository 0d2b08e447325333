import { Card, Typography } from 'antd';
import type { ReactNode } from 'react';
import { useDocumentTitle } from '@/hooks/use-document-title';
import { Brand } from './brand';

type AuthLayoutProps = {
  title: string;
  children: ReactNode;
  footer?: ReactNode;
  width?: number;
};

/** The pages before signing in: the name of the product and one centred card. */
export function AuthLayout({ title, children, footer, width = 440 }: AuthLayoutProps) {
  useDocumentTitle(title);
  return (
    <div style={{ minHeight: '100vh', display: 'flex', flexDirection: 'column', alignItems: 'center', padding: '48px 16px' }}>
      <Brand size="large" />
      <main style={{ width: '100%', maxWidth: width, marginTop: 24 }}>
        <Card>
          <Typography.Title level={1} style={{ fontSize: 26, marginTop: 0 }}>
            {title}
          </Typography.Title>
          {children}
        </Card>
        {footer && <div style={{ marginTop: 16, textAlign: 'center' }}>{footer}</div>}
      </main>
    </div>
  );
}
