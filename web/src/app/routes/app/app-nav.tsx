import { Menu } from 'antd';
import type { MenuProps } from 'antd';
import { Link, useLocation } from 'react-router-dom';
import type { Role } from '@swapwright/shared';
import { activeNavKey, navItemsFor } from '../../navigation';

export type AppNavProps = { role: Role; onNavigate?: () => void };

export function AppNav({ role, onNavigate }: AppNavProps) {
  const { pathname } = useLocation();
  const items = navItemsFor(role);
  const selected = activeNavKey(items, pathname);

  const toMenu = (group: 'work' | 'shop'): NonNullable<MenuProps['items']> =>
    items
      .filter((i) => i.group === group)
      .map((i) => ({
        key: i.key,
        label: (
          <Link to={i.to} onClick={onNavigate} aria-current={selected === i.key ? 'page' : undefined}>
            {i.label}
          </Link>
        ),
      }));

  const shop = toMenu('shop');
  const menuItems: MenuProps['items'] = [
    ...toMenu('work'),
    ...(shop.length > 0 ? [{ type: 'group' as const, key: 'shop-group', label: 'Shop', children: shop }] : []),
  ];

  return (
    <nav aria-label="Main">
      <Menu theme="dark" mode="inline" selectedKeys={selected ? [selected] : []} items={menuItems} style={{ borderInlineEnd: 0 }} />
    </nav>
  );
}
