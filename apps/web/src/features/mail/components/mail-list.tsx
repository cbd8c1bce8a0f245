import { Text, UnstyledButton } from '@mantine/core';
import type { CapturedMailSummary } from '@limitbook/contracts';
import { formatCompact, formatDateTime } from '@/lib/format';
import classes from './mail.module.css';

type Props = { mails: CapturedMailSummary[]; selectedId: string | null; onSelect: (id: string) => void };

export function MailList({ mails, selectedId, onSelect }: Props) {
  return (
    <ul className={classes.list} aria-label="Captured mail">
      {mails.map((mail) => (
        <li key={mail.id}>
          <UnstyledButton
            className={classes.item}
            data-selected={mail.id === selectedId || undefined}
            aria-current={mail.id === selectedId ? 'true' : undefined}
            onClick={() => onSelect(mail.id)}
          >
            <div className={classes.itemTop}>
              <Text size="sm" fw={600} truncate>
                {mail.to.join(', ')}
              </Text>
              <Text size="xs" c="dimmed" className={classes.time} title={formatDateTime(mail.receivedAt)}>
                <time dateTime={mail.receivedAt}>{formatCompact(mail.receivedAt)}</time>
              </Text>
            </div>
            <Text size="sm" c="gray.7" truncate>
              {mail.subject || '(no subject)'}
            </Text>
          </UnstyledButton>
        </li>
      ))}
    </ul>
  );
}
