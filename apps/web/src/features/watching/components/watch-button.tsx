import { Button } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { IconBell, IconBellOff } from '@tabler/icons-react';
import { useState } from 'react';
import { errorMessage } from '@/components/form/server-errors';
import { useWatchPage } from '../api/watch-page';

type Props = {
  pageId: string;
  documentNumber: string;
  watching: boolean;
  /** Called after the server agreed, e.g. to refresh the page that carries the flag. */
  onChanged?: (watching: boolean) => void;
};

/** Watch / Unwatch: a watcher gets a mail on every new release of the page. */
export function WatchButton({ pageId, documentNumber, watching: initial, onChanged }: Props) {
  const [watching, setWatching] = useState(initial);
  const mutation = useWatchPage(pageId);
  const toggle = () =>
    mutation.mutate(!watching, {
      onSuccess: (status) => {
        setWatching(status.watching);
        onChanged?.(status.watching);
        notifications.show({
          color: 'verdigris',
          title: status.watching ? `Watching ${documentNumber}` : `Stopped watching ${documentNumber}`,
          message: status.watching ? 'You get a mail when a new revision is released.' : 'No more release mail for this page.',
        });
      },
      onError: (error) => notifications.show({ color: 'redline', title: 'Not changed', message: errorMessage(error) }),
    });
  return (
    <Button
      size="xs"
      variant={watching ? 'light' : 'default'}
      leftSection={watching ? <IconBellOff size={16} /> : <IconBell size={16} />}
      onClick={toggle}
      loading={mutation.isPending}
      aria-pressed={watching}
    >
      {watching ? 'Unwatch' : 'Watch'}
    </Button>
  );
}
