import { useDocumentTitle } from '@mantine/hooks';
import { useParams, useSearchParams } from 'react-router-dom';
import { StandardView } from '@/features/standards/components/standard-view';

export function StandardRoute() {
  const documentNumber = (useParams().documentNumber ?? '').toUpperCase();
  const view = useSearchParams()[0].get('view') === 'draft' ? 'draft' : 'released';
  useDocumentTitle(`${documentNumber}${view === 'draft' ? ' (open revision)' : ''} · Limitbook`);
  return <StandardView key={`${documentNumber}:${view}`} documentNumber={documentNumber} view={view} />;
}
