import { QueryClientProvider, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { App as AntApp, ConfigProvider, Grid } from 'antd';
import { useEffect, type ReactNode } from 'react';
import { phoneTheme, theme } from '@/config/theme';
import { onSessionChange } from '@/lib/api-client';
import { registerNotifier } from '@/lib/notifier';
import { queryClient as defaultQueryClient } from '@/lib/query-client';
import { UnitsProvider } from '@/hooks/use-units';
import { authKeys } from '@/features/auth/api/auth-keys';
import { useCurrentUser } from '@/features/auth/api/get-current-user';

function NotifierBridge() {
  const { notification } = AntApp.useApp();
  useEffect(() => {
    registerNotifier(notification);
    return () => registerNotifier(null);
  }, [notification]);
  return null;
}

/** Keeps the cached user in step with token refreshes and session ends done by the api client. */
function SessionSync() {
  const queryClient = useQueryClient();
  useEffect(
    () =>
      onSessionChange((session) => {
        if (session) queryClient.setQueryData(authKeys.me(), session.user);
        else queryClient.clear();
      }),
    [queryClient],
  );
  return null;
}

function UnitsFromUser({ children }: { children: ReactNode }) {
  const { data: user } = useCurrentUser();
  return <UnitsProvider shopSystem={user?.shop.unitSystem ?? 'in'}>{children}</UnitsProvider>;
}

export type AppProviderProps = { children: ReactNode; queryClient?: QueryClient };

/** The shop's theme; on a phone (below antd's md, 768 px) with controls sized for a thumb. */
function ThemeByWidth({ children }: { children: ReactNode }) {
  const phone = Grid.useBreakpoint().md === false;
  return <ConfigProvider theme={phone ? phoneTheme : theme}>{children}</ConfigProvider>;
}

export function AppProvider({ children, queryClient = defaultQueryClient }: AppProviderProps) {
  return (
    <ThemeByWidth>
      <AntApp>
        <NotifierBridge />
        <QueryClientProvider client={queryClient}>
          <SessionSync />
          <UnitsFromUser>{children}</UnitsFromUser>
        </QueryClientProvider>
      </AntApp>
    </ThemeByWidth>
  );
}
