import { useDocumentTitle } from '@mantine/hooks';
import { LibraryHome } from '@/features/library/components/library-home';
import { WatchedPages } from '@/features/watching/components/watched-pages';
import { useSessionUser } from '@/lib/session';

export function LibraryRoute() {
  useDocumentTitle('Library · Limitbook');
  const user = useSessionUser();
  return <LibraryHome firstName={user.name.split(/\s+/)[0] ?? user.name} watched={<WatchedPages />} />;
}
