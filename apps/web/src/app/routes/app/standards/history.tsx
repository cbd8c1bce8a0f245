import { useDocumentTitle } from '@mantine/hooks';
import { useParams } from 'react-router-dom';
import { ReleaseImpactPanel } from '@/features/records/components/release-impact-panel';
import { RevisionHistory } from '@/features/revisions/components/revision-history';
import { useSessionUser } from '@/lib/session';
import { WithStandard } from './page-loader-gate';

export function StandardHistoryRoute() {
  const documentNumber = (useParams().documentNumber ?? '').toUpperCase();
  useDocumentTitle(`${documentNumber} history · Limitbook`);
  // Impact checks list other people's records: for those who write, review or administer standards.
  const seesImpact = useSessionUser().role !== 'reader';
  return (
    <WithStandard documentNumber={documentNumber}>
      {(page) => (
        <RevisionHistory
          page={page}
          renderReleaseExtra={seesImpact ? (entry) => <ReleaseImpactPanel pageId={page.id} revisionId={entry.id} revisionLetter={entry.revisionLetter} compact /> : undefined}
        />
      )}
    </WithStandard>
  );
}
