import { useDocumentTitle } from '@mantine/hooks';
import { PageHeader } from '@/components/layout/page-header';
import { AuditLog } from '@/features/audit/components/audit-log';

export function AuditRoute() {
  useDocumentTitle('Audit log · Limitbook');
  return (
    <>
      <PageHeader eyebrow="Admin" title="Audit log" description="Sign-ins, invitations, role changes and other account events, newest first." />
      <AuditLog />
    </>
  );
}
