import { Button, Group, SegmentedControl, Skeleton, Stack, Text, Title } from '@mantine/core';
import { IconArrowLeft } from '@tabler/icons-react';
import { useState } from 'react';
import { PanelError } from '@/components/errors/panel-error';
import { formatDateTime } from '@/lib/format';
import { useMail } from '../api/get-mail';
import { LinkifiedText } from './linkified-text';
import classes from './mail.module.css';

type Props = { id: string; onBack: () => void };

export function MailReader({ id, onBack }: Props) {
  const mail = useMail(id);
  const [view, setView] = useState<'text' | 'html'>('text');

  if (mail.isPending) {
    return (
      <Stack gap="sm" p="lg" aria-busy="true">
        <Skeleton h={24} w="60%" />
        <Skeleton h={14} w="40%" />
        <Skeleton h={160} mt="md" />
      </Stack>
    );
  }
  if (mail.isError) return <PanelError error={mail.error} onRetry={() => void mail.refetch()} title="This message could not be opened" />;

  const message = mail.data;
  return (
    <article className={classes.reader} aria-labelledby="mail-subject">
      <Button variant="subtle" size="xs" leftSection={<IconArrowLeft size={14} />} onClick={onBack} hiddenFrom="md" mb="sm">
        All mail
      </Button>
      <Title order={2} id="mail-subject" className={classes.subject}>
        {message.subject || '(no subject)'}
      </Title>
      <dl className={classes.meta}>
        <dt>From</dt>
        <dd>{message.from}</dd>
        <dt>To</dt>
        <dd>{message.to.join(', ')}</dd>
        <dt>Received</dt>
        <dd>
          <time dateTime={message.receivedAt}>{formatDateTime(message.receivedAt)}</time>
        </dd>
      </dl>
      {message.html !== null && (
        <Group mb="sm">
          <SegmentedControl
            size="xs"
            value={view}
            onChange={(value) => setView(value === 'html' ? 'html' : 'text')}
            data={[
              { value: 'text', label: 'Text' },
              { value: 'html', label: 'HTML preview' },
            ]}
            aria-label="Message part"
          />
        </Group>
      )}
      {view === 'html' && message.html !== null ? (
        <>
          {/* An empty sandbox: no scripts, no forms, no navigation, no same-origin access. */}
          <iframe title="HTML part of the message" sandbox="" srcDoc={message.html} className={classes.htmlFrame} />
          <Text size="xs" c="dimmed" mt={6}>
            Links in the preview are inert; use the text part to follow them.
          </Text>
        </>
      ) : (
        <div className={classes.body}>
          <LinkifiedText text={message.text} />
        </div>
      )}
    </article>
  );
}
