import { Avatar, Button, Dropdown, Flex, Typography } from 'antd';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { palette } from '@/config/theme';
import { useSignOut } from '@/features/auth/api/sign-out';
import type { CurrentUser } from '@/types/api';

const roleNames: Record<CurrentUser['role'], string> = {
  owner: 'Owner',
  estimator: 'Estimator',
  fabricator: 'Fabricator',
  counter: 'Parts counter',
  customer: 'Customer',
};

function initials(name: string): string {
  return name
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((p) => p[0]!.toUpperCase())
    .join('');
}

export type UserMenuProps = { user: CurrentUser };

export function UserMenu({ user }: UserMenuProps) {
  const navigate = useNavigate();
  const signOut = useSignOut({ onSettled: () => navigate(paths.signIn, { replace: true }) });

  return (
    <Dropdown
      trigger={['click']}
      menu={{
        items: [
          { key: 'who', type: 'group', label: `${user.email}` },
          { type: 'divider' },
          { key: 'sign-out', label: 'Sign out', onClick: () => signOut.mutate() },
        ],
      }}
    >
      <Button type="text" aria-label={`Account: ${user.name}`} style={{ height: 44, paddingInline: 8 }}>
        <Flex align="center" gap={10}>
          <Avatar size={30} style={{ background: palette.teal700, fontWeight: 600, fontSize: 13 }}>
            {initials(user.name) || '?'}
          </Avatar>
          <Flex vertical align="flex-start" style={{ lineHeight: 1.15 }}>
            <Typography.Text strong>{user.name}</Typography.Text>
            <Typography.Text type="secondary" style={{ fontSize: 12 }}>
              {roleNames[user.role]}
            </Typography.Text>
          </Flex>
        </Flex>
      </Button>
    </Dropdown>
  );
}
