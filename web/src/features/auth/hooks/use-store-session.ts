import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { tokenStorage } from '@/lib/token-storage';
import type { Session } from '@/lib/api-types';
import { authKeys } from '../api/auth-keys';

export function useStoreSession(): (session: Session) => void {
  const queryClient = useQueryClient();
  return useCallback(
    (session: Session) => {
      // Data cached for a previous person must never show for the next one.
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.all[0] });
      tokenStorage.set({ accessToken: session.accessToken, refreshToken: session.refreshToken });
      queryClient.setQueryData(authKeys.me(), session.user);
    },
    [queryClient],
  );
}
