import { useDocumentTitle } from '@mantine/hooks';
import { useParams, useSearchParams } from 'react-router-dom';
import { RevisionCompareView } from '@/features/revisions/components/revision-compare';
import { WithStandard } from './page-loader-gate';

export function StandardCompareRoute() {
  const documentNumber = (useParams().documentNumber ?? '').toUpperCase();
  const [params] = useSearchParams();
  useDocumentTitle(`${documentNumber} compare · Limitbook`);
  return <WithStandard documentNumber={documentNumber}>{(page) => <RevisionCompareView page={page} from={params.get('from')} to={params.get('to')} />}</WithStandard>;
}
