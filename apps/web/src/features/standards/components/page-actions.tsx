import { Alert, Button, Group, Modal, Stack, Text, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import type { Page } from '@limitbook/contracts';
import { IconArchive, IconArchiveOff, IconHistory, IconPencil } from '@tabler/icons-react';
import { useState, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { applyServerErrors } from '@/components/form/server-errors';
import { paths } from '@/config/paths';
import { canAccess } from '@/lib/authorization';
import { useSessionUser } from '@/lib/session';
import { useObsoleteToggle } from '../api/obsolete-page';

function ObsoleteModal({ page, opened, onClose }: { page: Page; opened: boolean; onClose: () => void }) {
  const toggle = useObsoleteToggle(page.id, page.documentNumber);
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm({
    mode: 'controlled',
    initialValues: { reason: '' },
    validate: { reason: (reason) => (reason.trim() ? null : 'Give a reason') },
  });
  const close = () => {
    form.reset();
    setProblem(null);
    toggle.reset();
    onClose();
  };
  const submit = form.onSubmit((values) => {
    setProblem(null);
    toggle.mutate(
      { kind: 'obsolete', body: { reason: values.reason.trim() } },
      {
        onSuccess: () => {
          notifications.show({ color: 'amber', title: `${page.documentNumber} is obsolete`, message: 'It stays readable with the reason shown, and leaves lists and search.' });
          close();
        },
        onError: (error) => setProblem(applyServerErrors(form, error, ['reason'])),
      },
    );
  });
  return (
    <Modal opened={opened} onClose={close} title={`Mark ${page.documentNumber} obsolete?`}>
      <form onSubmit={submit} noValidate>
        <Stack gap="md">
          <Text size="sm">Readers can still open the page, with a banner giving your reason, but it leaves the library lists and search. You can reinstate it later.</Text>
          {problem && (
            <Alert color="redline" title="Not marked obsolete" role="alert">
              {problem}
            </Alert>
          )}
          <Textarea label="Reason" description="Say what replaces it, if anything." required rows={3} maxLength={2000} {...form.getInputProps('reason')} />
          <Group justify="flex-end">
            <Button variant="default" onClick={close}>
              Cancel
            </Button>
            <Button type="submit" color="redline" loading={toggle.isPending}>
              Mark obsolete
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}

function ReinstateButton({ page }: { page: Page }) {
  const toggle = useObsoleteToggle(page.id, page.documentNumber);
  return (
    <Button
      variant="default"
      size="xs"
      leftSection={<IconArchiveOff size={16} />}
      loading={toggle.isPending}
      onClick={() =>
        toggle.mutate(
          { kind: 'reinstate' },
          {
            onSuccess: () => notifications.show({ color: 'verdigris', title: `${page.documentNumber} reinstated`, message: 'It is back in the library lists and search.' }),
            onError: (error) => notifications.show({ color: 'redline', title: 'Not reinstated', message: error.message }),
          },
        )
      }
    >
      Reinstate
    </Button>
  );
}

/** The standard's header actions by role: edit, history, the caller's own extras (watch), and admin obsolete/reinstate. */
export function PageActions({ page, extra }: { page: Page; extra?: ReactNode }) {
  const role = useSessionUser().role;
  const [obsoleting, setObsoleting] = useState(false);
  const editor = canAccess(role, 'standards.edit');
  const admin = role === 'admin';
  return (
    <Group gap="xs" wrap="wrap" aria-label="Page actions" role="group">
      {editor && (
        <Button component={Link} to={paths.standards.edit.getHref(page.documentNumber)} size="xs" leftSection={<IconPencil size={16} />}>
          {page.draft ? 'Continue the draft' : 'Edit'}
        </Button>
      )}
      <Button component={Link} to={paths.standards.history.getHref(page.documentNumber)} size="xs" variant="default" leftSection={<IconHistory size={16} />}>
        History
      </Button>
      {extra}
      {admin &&
        (page.obsolete ? (
          <ReinstateButton page={page} />
        ) : (
          <Button size="xs" variant="subtle" color="redline" leftSection={<IconArchive size={16} />} onClick={() => setObsoleting(true)}>
            Obsolete…
          </Button>
        ))}
      {admin && <ObsoleteModal page={page} opened={obsoleting} onClose={() => setObsoleting(false)} />}
    </Group>
  );
}
