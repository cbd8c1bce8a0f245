import { Button, Center, Stack, Text, Title } from '@mantine/core';
import { useDocumentTitle } from '@mantine/hooks';
import { Link, useLocation } from 'react-router-dom';
import { Logo } from '@/components/brand/logo';
import { paths } from '@/config/paths';

export function NotFoundRoute() {
  useDocumentTitle('Page not found · Limitbook');
  const { pathname } = useLocation();
  return (
    <Center mih="100vh" p="xl">
      <Stack align="center" gap="md" ta="center" maw={480}>
        <Logo size={30} />
        <Text ff="monospace" c="redline.7" fw={500} mt="lg">
          404
        </Text>
        <Title order={1}>Page not found</Title>
        <Text c="dimmed">
          Nothing lives at <code>{pathname}</code>. The address may be mistyped, or the page moved.
        </Text>
        <Button component={Link} to={paths.library.home.getHref()}>
          Go to the library
        </Button>
      </Stack>
    </Center>
  );
}
