import { useDocumentTitle } from '@mantine/hooks';
import { PageHeader } from '@/components/layout/page-header';
import { AuditLog } from '@/features/audit/components/audit-log';

export function AuditRoute() {
  useDocumentTitle('Audit log · Limitbook');
  return (
    <>
      <PageHeader eyebrow="Admin" title="Audit log" description="Who changed what, and when: invitations, role and status changes and other recorded events, newest first." />
      <AuditLog />
    </>
  );
}
