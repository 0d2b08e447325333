import { KeyOutlined, LogoutOutlined, MenuFoldOutlined, MenuUnfoldOutlined, ShopOutlined } from '@ant-design/icons';
import type { UserDto } from '@causeway/shared';
import { Button, Flex, Layout, Menu, Tag, Typography } from 'antd';
import { useMemo, useState, type ReactNode } from 'react';
import { useLocation, useNavigate, useNavigation } from 'react-router-dom';
import { ROLE_LABELS } from '@/config/roles';
import { palette } from '@/config/theme';
import { Brand } from './brand';
import { navigationItems, selectedNavigationKey } from './navigation';

const NAV_ID = 'main-navigation';

type AppLayoutProps = {
  user: UserDto;
  onSignOut: () => void;
  onChangePassword: () => void;
  children: ReactNode;
};

/** The signed-in frame: side navigation by role, a header with who is signed in, the page. */
export function AppLayout({ user, onSignOut, onChangePassword, children }: AppLayoutProps) {
  const [collapsed, setCollapsed] = useState(false);
  const navigate = useNavigate();
  const { pathname } = useLocation();
  const navigation = useNavigation();
  const items = useMemo(() => navigationItems(user), [user]);
  const selected = selectedNavigationKey(pathname, user);

  return (
    <Layout style={{ minHeight: '100vh' }}>
      <a className="skip-link" href="#main-content">
        Skip to the page
      </a>
      <Layout.Sider
        id={NAV_ID}
        width={248}
        collapsedWidth={72}
        collapsible
        collapsed={collapsed}
        // The built-in trigger is not focusable; the header has a real button instead.
        trigger={null}
        theme="light"
        breakpoint="lg"
        onBreakpoint={(broken) => setCollapsed(broken)}
        style={{ borderRight: `1px solid ${palette.grey200}` }}
      >
        <div style={{ height: 64, display: 'flex', alignItems: 'center', padding: '0 20px' }}>
          <Brand collapsed={collapsed} />
        </div>
        <nav aria-label="Main">
          <Menu
            mode="inline"
            items={items}
            selectedKeys={selected ? [selected] : []}
            onClick={({ key }) => navigate(key)}
            style={{ borderInlineEnd: 'none' }}
          />
        </nav>
      </Layout.Sider>
      <Layout>
        <Layout.Header
          style={{
            display: 'flex',
            alignItems: 'center',
            gap: 12,
            borderBottom: `1px solid ${palette.grey200}`,
            position: 'sticky',
            top: 0,
            zIndex: 10,
            lineHeight: 1.6,
          }}
        >
          <Button
            type="text"
            icon={collapsed ? <MenuUnfoldOutlined aria-hidden /> : <MenuFoldOutlined aria-hidden />}
            aria-label={collapsed ? 'Expand the navigation' : 'Collapse the navigation'}
            aria-expanded={!collapsed}
            aria-controls={NAV_ID}
            onClick={() => setCollapsed((c) => !c)}
          />
          <Flex align="center" gap={8} style={{ minWidth: 0 }}>
            <ShopOutlined aria-hidden style={{ color: palette.grey600 }} />
            <Typography.Text ellipsis style={{ maxWidth: 280 }} data-testid="header-shop">
              {user.shop?.name ?? 'No shop'}
            </Typography.Text>
          </Flex>
          <Flex align="center" gap={8} wrap style={{ marginLeft: 'auto' }}>
            <Typography.Text strong data-testid="header-user">
              {user.displayName}
            </Typography.Text>
            <Tag color={palette.teal600}>{ROLE_LABELS[user.role]}</Tag>
            {user.shopOwner && <Tag>Shop owner</Tag>}
            <Button type="text" icon={<KeyOutlined aria-hidden />} onClick={onChangePassword}>
              Change password
            </Button>
            <Button icon={<LogoutOutlined aria-hidden />} onClick={onSignOut}>
              Sign out
            </Button>
          </Flex>
        </Layout.Header>
        {navigation.state === 'loading' && <div className="route-progress" role="progressbar" aria-label="Loading the page" />}
        <Layout.Content id="main-content" tabIndex={-1} style={{ padding: '24px clamp(16px, 3vw, 40px)', outline: 'none' }}>
          <div style={{ maxWidth: 1280 }}>{children}</div>
        </Layout.Content>
      </Layout>
    </Layout>
  );
}
