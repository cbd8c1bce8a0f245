import { useDocumentTitle } from '@mantine/hooks';
import { useParams } from 'react-router-dom';
import { StandardView } from '@/features/standards/components/standard-view';

export function StandardRoute() {
  const documentNumber = (useParams().documentNumber ?? '').toUpperCase();
  useDocumentTitle(`${documentNumber} · Limitbook`);
  return <StandardView key={documentNumber} documentNumber={documentNumber} />;
}
