import { Typography } from 'antd';
import { useParams } from 'react-router-dom';
import { PagePlaceholder } from '@/components/page-placeholder';
import { section } from '@/config/sections';

// Placeholder until the code decoder is built; the home page's code box already links here.
export function Component() {
  const { code } = useParams();
  return (
    <>
      <PagePlaceholder section={section('codes')} />
      {code && (
        <Typography.Paragraph>
          You asked about <Typography.Text code>{code}</Typography.Text>.
        </Typography.Paragraph>
      )}
    </>
  );
}
