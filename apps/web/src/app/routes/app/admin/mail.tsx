import { useDocumentTitle } from '@mantine/hooks';
import { PageHeader } from '@/components/layout/page-header';
import { MailInbox } from '@/features/mail/components/mail-inbox';

export function MailRoute() {
  useDocumentTitle('Mail · Limitbook');
  return (
    <>
      <PageHeader
        eyebrow="Admin"
        title="Outgoing mail"
        description="Messages Limitbook sent while no mail server is configured. They are kept here instead of being delivered."
      />
      <MailInbox />
    </>
  );
}
