import { useDocumentTitle } from '@mantine/hooks';
import { useParams } from 'react-router-dom';
import { CollectionView } from '@/features/library/components/collection-view';

export function CollectionRoute() {
  const collectionKey = useParams().collectionKey ?? '';
  useDocumentTitle('Collection · Limitbook');
  return <CollectionView collectionKey={collectionKey} />;
}
