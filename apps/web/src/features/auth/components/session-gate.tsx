import { Center, Loader } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { useSession } from '@/lib/session';
import { restoreSessionQueryOptions } from '../api/restore-session';

/** Holds rendering until the refresh cookie has been tried, so a reload does not flash the sign-in page. */
export function SessionGate({ children }: { children: ReactNode }) {
  const state = useSession();
  useQuery({ ...restoreSessionQueryOptions(), enabled: state.status === 'restoring' });
  if (state.status === 'restoring') {
    return (
      <Center mih="100vh" role="status" aria-label="Restoring your session">
        <Loader size="sm" type="dots" />
      </Center>
    );
  }
  return children;
}
