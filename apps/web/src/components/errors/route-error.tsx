import { Button, Group, Stack, Text, Title } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { errorMessage } from '@/components/form/server-errors';
import { paths } from '@/config/paths';

function describe(error: unknown): { title: string; detail: string } {
  if (isRouteErrorResponse(error)) {
    if (error.status === 404) return { title: 'Page not found', detail: 'There is nothing at this address.' };
    return { title: `Error ${error.status}`, detail: error.statusText };
  }
  // A deploy replaced the chunks this tab was about to load.
  if (error instanceof TypeError && /dynamically imported module|Importing a module script failed/i.test(error.message)) {
    return { title: 'Limitbook was updated', detail: 'Reload the page to load the new version.' };
  }
  return { title: 'This page failed to load', detail: errorMessage(error) };
}

/** Per-route error element: the rest of the app (navigation, user menu) keeps working. */
export function RouteError() {
  const error = useRouteError();
  const { title, detail } = describe(error);
  if (!isRouteErrorResponse(error)) console.error(error);
  return (
    <Stack role="alert" align="flex-start" gap="sm" p="xl" maw={560}>
      <IconAlertTriangle size={32} stroke={1.5} color="var(--mantine-color-redline-6)" aria-hidden />
      <Title order={2}>{title}</Title>
      <Text c="dimmed">{detail}</Text>
      <Group>
        <Button onClick={() => window.location.reload()}>Reload</Button>
        <Button variant="default" component={Link} to={paths.library.home.getHref()}>
          Go to the library
        </Button>
      </Group>
    </Stack>
  );
}
