import { ArrowRightOutlined } from '@ant-design/icons';
import type { ShopDto } from '@causeway/shared';
import { Card, Col, Descriptions, Row, Typography } from 'antd';
import { Link } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { sectionIcon, visibleSections } from '@/components/layouts/navigation';
import { CodeEntry } from '@/features/codes/components/code-entry';
import { useCurrentUser } from '@/lib/current-user';
import { formatMoney, formatTaxRate, grossFromNet } from '@/utils/money';

function LabourRate({ shop }: { shop: ShopDto }) {
  const { labourRateMinor, taxRateBp, currency, locale } = shop;
  return (
    <Card title={`Labour rate at ${shop.name}`}>
      <Descriptions
        column={1}
        items={[
          { key: 'net', label: 'Per hour before tax', children: <span data-testid="labour-net">{formatMoney(labourRateMinor, currency, locale)}</span> },
          {
            key: 'gross',
            label: `Per hour with ${formatTaxRate(taxRateBp, locale)} tax`,
            children: <span data-testid="labour-gross">{formatMoney(grossFromNet(labourRateMinor, taxRateBp), currency, locale)}</span>,
          },
        ]}
      />
    </Card>
  );
}

function CodeBox() {
  return (
    <Card>
      <CodeEntry label="Look up a fault code" />
    </Card>
  );
}

export function Component() {
  const user = useCurrentUser();
  const links = visibleSections(user).filter((s) => s.key !== 'home');
  return (
    <>
      <PageHeader title={`Welcome, ${user.displayName}`} description={user.shop ? `Signed in at ${user.shop.name}.` : 'Your account does not belong to a shop.'} />
      <Row gutter={[24, 24]}>
        <Col xs={24} lg={12}>
          <CodeBox />
        </Col>
        <Col xs={24} lg={12}>
          {user.shop ? (
            <LabourRate shop={user.shop} />
          ) : (
            <Card title="Labour rate">
              <Typography.Paragraph style={{ marginBottom: 0 }}>
                Labour rates belong to a shop. Ask the owner of your shop for an invite code.
              </Typography.Paragraph>
            </Card>
          )}
        </Col>
      </Row>
      <Typography.Title level={2} style={{ fontSize: 22, marginTop: 32 }}>
        Go to
      </Typography.Title>
      <Row gutter={[16, 16]}>
        {links.map((s) => (
          <Col key={s.key} xs={24} sm={12} xl={8}>
            <Link to={s.path} className="quick-link">
              <Card hoverable style={{ height: '100%' }}>
                <Card.Meta
                  avatar={sectionIcon(s.key)}
                  title={
                    <span>
                      {s.label} <ArrowRightOutlined aria-hidden />
                    </span>
                  }
                  description={s.purpose}
                />
              </Card>
            </Link>
          </Col>
        ))}
      </Row>
    </>
  );
}
