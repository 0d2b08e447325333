import { Card, Col, Row, Typography } from 'antd';
import { PageHeader } from '@/components/page-header';
import { section } from '@/config/sections';
import { CodeEntry } from '@/features/codes/components/code-entry';
import { CodeSearch } from '@/features/codes/components/code-search';
import { CodesTable } from '@/features/codes/components/codes-table';
import { parseCodeListParams, toCodeListSearch } from '@/features/codes/utils/list-params';
import { useSearchParamsState } from '@/hooks/use-search-params-state';

export function Component() {
  const [params, setParams] = useSearchParamsState(parseCodeListParams, toCodeListSearch);
  const page = section('codes');
  return (
    <>
      <PageHeader title={page.label} description={page.purpose} />
      <Row gutter={[24, 24]}>
        <Col xs={24} xl={12}>
          <Card style={{ height: '100%' }}>
            <CodeEntry label="Look up a fault code" autoFocus />
          </Card>
        </Col>
        <Col xs={24} xl={12}>
          <Card style={{ height: '100%' }}>
            <CodeSearch />
          </Card>
        </Col>
      </Row>
      <section aria-labelledby="browse-codes" style={{ marginTop: 32 }}>
        <Typography.Title level={2} id="browse-codes" style={{ fontSize: 22 }}>
          Browse the catalogue
        </Typography.Title>
        <CodesTable params={params} onParamsChange={setParams} />
      </section>
    </>
  );
}
