import { Card, Flex, Result } from 'antd';
import { PageHeader } from '@/components/page-header';
import { section } from '@/config/sections';
import { InvitesPanel } from '@/features/shop/components/invites-panel';
import { MembersTable } from '@/features/shop/components/members-table';
import { ShopSettingsForm } from '@/features/shop/components/shop-settings-form';
import { useCurrentUser } from '@/lib/current-user';

export function Component() {
  const { shop } = useCurrentUser();
  const page = section('shop');
  if (!shop) return <Result status="info" title="Your account does not belong to a shop" />;
  return (
    <>
      <PageHeader title={page.label} description={page.purpose} />
      <Flex vertical gap={24}>
        <Card title="Rates and units">
          <ShopSettingsForm key={shop.id} shop={shop} />
        </Card>
        <Card>
          <InvitesPanel locale={shop.locale} />
        </Card>
        <Card>
          <MembersTable locale={shop.locale} />
        </Card>
      </Flex>
    </>
  );
}
