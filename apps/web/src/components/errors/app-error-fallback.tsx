import { Button, Center, Code, Stack, Text, Title } from '@mantine/core';
import { LogoMark } from '@/components/brand/logo';
import { errorMessage } from '@/components/form/server-errors';

/** Last line of defence: shown when the app itself cannot render. */
export function AppErrorFallback({ error }: { error: unknown }) {
  return (
    <Center mih="100vh" p="xl" role="alert">
      <Stack align="center" gap="md" maw={460} ta="center">
        <LogoMark size={44} />
        <Title order={1}>Limitbook stopped unexpectedly</Title>
        <Text c="dimmed">
          The page hit an error it could not recover from. Reloading usually fixes it; nothing you saved is lost.
        </Text>
        <Code block w="100%" ta="left">
          {errorMessage(error)}
        </Code>
        <Button onClick={() => window.location.assign(window.location.pathname)}>Reload Limitbook</Button>
      </Stack>
    </Center>
  );
}
