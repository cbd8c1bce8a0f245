import { useDocumentTitle } from '@mantine/hooks';
import { useQueryClient } from '@tanstack/react-query';
import { useParams, useSearchParams } from 'react-router-dom';
import { ReleaseImpactPanel } from '@/features/records/components/release-impact-panel';
import { SaveRecordButton } from '@/features/records/components/save-record-button';
import { getPageQueryOptions } from '@/features/standards/api/get-page';
import { StandardView } from '@/features/standards/components/standard-view';
import { WatchButton } from '@/features/watching/components/watch-button';
import { useSessionUser } from '@/lib/session';

export function StandardRoute() {
  const documentNumber = (useParams().documentNumber ?? '').toUpperCase();
  const view = useSearchParams()[0].get('view') === 'draft' ? 'draft' : 'released';
  const queryClient = useQueryClient();
  // Impact checks list other people's records: for those who write, review or administer standards.
  const seesImpact = useSessionUser().role !== 'reader';
  useDocumentTitle(`${documentNumber}${view === 'draft' ? ' (open revision)' : ''} · Limitbook`);
  return (
    <StandardView
      key={`${documentNumber}:${view}`}
      documentNumber={documentNumber}
      view={view}
      headerActions={(page) => (
        <WatchButton
          pageId={page.id}
          documentNumber={page.documentNumber}
          watching={page.watching}
          onChanged={() => void queryClient.invalidateQueries({ queryKey: getPageQueryOptions(documentNumber, 'released').queryKey })}
        />
      )}
      releaseNotes={
        seesImpact && view === 'released'
          ? (page) => <ReleaseImpactPanel key={page.revision.id} pageId={page.id} revisionId={page.revision.id} revisionLetter={page.revision.revisionLetter} />
          : undefined
      }
      calculatorActions={({ page, block, inputs, unit, evaluated }) => (
        <SaveRecordButton
          pageId={page.id}
          revisionId={page.revision.id}
          documentNumber={page.documentNumber}
          revisionLetter={page.revision.revisionLetter}
          blockId={block.blockId}
          caption={block.caption || block.method}
          inputs={inputs}
          unit={unit}
          evaluated={evaluated}
        />
      )}
    />
  );
}
