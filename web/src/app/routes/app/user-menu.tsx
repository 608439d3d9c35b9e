import { Avatar, Button, Dropdown, Flex, Typography } from 'antd';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { palette } from '@/config/theme';
import { useSignOut } from '@/features/auth/api/sign-out';
import type { CurrentUser } from '@/lib/api-types';

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

export type UserMenuProps = {
  user: CurrentUser;
  /** On a phone: name and role shortened with an ellipsis rather than pushing the bar wider than the screen. */
  compact?: boolean;
};

export function UserMenu({ user, compact = false }: UserMenuProps) {
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
      <Button type="text" aria-label={`Account: ${user.name}`} title={`${user.name}, ${roleNames[user.role]}`} style={{ height: 44, paddingInline: compact ? 4 : 8, minWidth: 0, maxWidth: '100%' }}>
        <Flex align="center" gap={compact ? 6 : 10} style={{ minWidth: 0 }}>
          <Avatar size={30} style={{ background: palette.teal700, fontWeight: 600, fontSize: 13, flex: 'none' }}>
            {initials(user.name) || '?'}
          </Avatar>
          <Flex vertical align="flex-start" style={{ lineHeight: 1.15, minWidth: 0, maxWidth: compact ? 150 : 240 }}>
            <Typography.Text strong ellipsis style={{ maxWidth: '100%' }}>
              {user.name}
            </Typography.Text>
            <Typography.Text type="secondary" ellipsis style={{ fontSize: 12, maxWidth: '100%' }}>
              {roleNames[user.role]}
            </Typography.Text>
          </Flex>
        </Flex>
      </Button>
    </Dropdown>
  );
}
