import { Typography } from 'antd';
import type { ReactNode } from 'react';
import { useDocumentTitle } from '@/hooks/use-document-title';

type PageHeaderProps = {
  title: string;
  description?: ReactNode;
  extra?: ReactNode;
};

export function PageHeader({ title, description, extra }: PageHeaderProps) {
  useDocumentTitle(title);
  return (
    <div style={{ display: 'flex', flexWrap: 'wrap', gap: 16, alignItems: 'flex-start', justifyContent: 'space-between', marginBottom: 24 }}>
      <div style={{ maxWidth: 760 }}>
        <Typography.Title level={1} style={{ fontSize: 30, marginBottom: 4 }}>
          {title}
        </Typography.Title>
        {description && (
          <Typography.Paragraph type="secondary" style={{ fontSize: 17, marginBottom: 0 }}>
            {description}
          </Typography.Paragraph>
        )}
      </div>
      {extra}
    </div>
  );
}
