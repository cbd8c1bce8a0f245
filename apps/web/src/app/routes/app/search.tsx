import { useDocumentTitle } from '@mantine/hooks';
import { useSearchParams } from 'react-router-dom';
import { SearchView } from '@/features/library/components/search-view';

export function SearchRoute() {
  const q = useSearchParams()[0].get('q');
  useDocumentTitle(q ? `${q} · Search · Limitbook` : 'Search · Limitbook');
  return <SearchView />;
}
