import { useDocumentTitle } from '@mantine/hooks';
import { RecordsView } from '@/features/records/components/records-view';

export function RecordsRoute() {
  useDocumentTitle('My records · Limitbook');
  return <RecordsView />;
}
