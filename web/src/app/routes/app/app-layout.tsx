import { Drawer, Flex, Grid, Layout, Typography, Button } from 'antd';
import { Suspense, useState } from 'react';
import { Link, Outlet } from 'react-router-dom';
import { paths } from '@/config/paths';
import { palette, siderWidth, spacing } from '@/config/theme';
import { Logo, LogoMark } from '@/components/logo';
import { LoadingState } from '@/components/query-state';
import { PlanningNote } from '@/components/planning-note';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { AppNav } from './app-nav';
import { UnitSwitch } from './unit-switch';
import { UserMenu } from './user-menu';

export function AppLayout() {
  const user = useSignedInUser();
  const screens = Grid.useBreakpoint();
  const isNarrow = screens.lg === false;
  const [navOpen, setNavOpen] = useState(false);

  const brand = (
    <Link to={paths.home} aria-label="Swapwright" style={{ display: 'block', padding: `${spacing.md}px ${spacing.lg}px ${spacing.sm}px` }}>
      <Logo tone="light" size={28} />
    </Link>
  );
  const shopName = (
    <Typography.Text
      style={{ display: 'block', color: '#8fb0ad', fontSize: 12, padding: `0 ${spacing.lg}px ${spacing.md}px`, textTransform: 'uppercase', letterSpacing: '0.08em' }}
      ellipsis
    >
      {user.shop.name}
    </Typography.Text>
  );

  return (
    <Layout style={{ minHeight: '100vh' }}>
      {!isNarrow && (
        <Layout.Sider width={siderWidth} style={{ position: 'sticky', top: 0, height: '100vh', overflow: 'auto' }}>
          {brand}
          {shopName}
          <AppNav role={user.role} />
        </Layout.Sider>
      )}
      {isNarrow && (
        <Drawer
          open={navOpen}
          onClose={() => setNavOpen(false)}
          placement="left"
          size={siderWidth + 24}
          styles={{ body: { padding: 0, background: palette.teal900 }, header: { display: 'none' } }}
        >
          {brand}
          {shopName}
          <AppNav role={user.role} onNavigate={() => setNavOpen(false)} />
        </Drawer>
      )}
      <Layout>
        <Layout.Header
          style={{
            display: 'flex',
            alignItems: 'center',
            justifyContent: 'space-between',
            gap: spacing.sm,
            borderBottom: `1px solid ${palette.line}`,
            position: 'sticky',
            top: 0,
            zIndex: 10,
            // a phone keeps the bar within its width: less padding, the mark without the wordmark
            ...(isNarrow ? { paddingInline: spacing.sm } : {}),
          }}
        >
          <Flex align="center" gap={isNarrow ? 8 : 12} style={{ flex: 'none' }}>
            {isNarrow && (
              <Button aria-label="Open navigation" onClick={() => setNavOpen(true)}>
                Menu
              </Button>
            )}
            {isNarrow && <LogoMark size={24} title="Swapwright" />}
          </Flex>
          <Flex align="center" gap={isNarrow ? 8 : 16} style={{ marginInlineStart: 'auto', minWidth: 0 }}>
            <UnitSwitch />
            <UserMenu user={user} compact={isNarrow} />
          </Flex>
        </Layout.Header>
        <Layout.Content style={{ padding: isNarrow ? spacing.md : `${spacing.lg}px ${spacing.xl}px`, maxWidth: 1320, width: '100%' }}>
          <main>
            <Suspense fallback={<LoadingState rows={8} testId="page-loading" />}>
              <Outlet />
            </Suspense>
          </main>
        </Layout.Content>
        <Layout.Footer style={{ borderTop: `1px solid ${palette.line}` }}>
          <PlanningNote />
        </Layout.Footer>
      </Layout>
    </Layout>
  );
}
