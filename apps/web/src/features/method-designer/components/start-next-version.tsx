import { Alert, Button, Stack, Text, Title } from '@mantine/core';
import { IconPencilPlus } from '@tabler/icons-react';
import { errorMessage } from '@/components/form/server-errors';
import { useStartMethodDraft } from '../api/start-method-draft';

/** A released method with no open draft: the author starts the next version from the release. */
export function StartNextVersion({ slug, name, latestVersion }: { slug: string; name: string; latestVersion: number }) {
  const start = useStartMethodDraft(slug);
  return (
    <Stack gap="md" maw={640}>
      <Title order={1}>{name}</Title>
      <Text>
        v{latestVersion} is released and there is no open draft. A new draft starts as a copy of v{latestVersion}; readers keep v{latestVersion} until the next version is reviewed and approved.
      </Text>
      {start.isError && (
        <Alert color="redline" title="No draft started" role="alert">
          {errorMessage(start.error)}
        </Alert>
      )}
      <Button w="fit-content" leftSection={<IconPencilPlus size={16} />} onClick={() => start.mutate()} loading={start.isPending}>
        Start v{latestVersion + 1}
      </Button>
    </Stack>
  );
}
