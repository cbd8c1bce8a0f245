import { useDocumentTitle } from '@mantine/hooks';
import { useParams } from 'react-router-dom';
import { RecordView } from '@/features/records/components/record-view';

export function RecordRoute() {
  const recordId = useParams().recordId ?? '';
  useDocumentTitle('Calculation record · Limitbook');
  return <RecordView recordId={recordId} />;
}
