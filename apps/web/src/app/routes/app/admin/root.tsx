import { Button, Stack, Text, Title } from '@mantine/core';
import { IconLock } from '@tabler/icons-react';
import { Link, Outlet, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';
import { canAccess, type Area } from '@/lib/authorization';
import { useSessionUser } from '@/lib/session';

const areaOf: Record<string, Area> = {
  [paths.admin.users.path]: 'admin.users',
  [paths.admin.mail.path]: 'admin.mail',
  [paths.admin.audit.path]: 'admin.audit',
};

/** Admin pages for admins only; others see why instead of a blank page. */
export function AdminRoot() {
  const user = useSessionUser();
  const { pathname } = useLocation();
  const area = areaOf[pathname.replace(/\/+$/, '')] ?? 'admin.users';
  if (canAccess(user.role, area)) return <Outlet />;
  return (
    <Stack align="flex-start" gap="sm" maw={520} py="xl" role="alert">
      <IconLock size={32} stroke={1.5} aria-hidden />
      <Title order={1}>Admins only</Title>
      <Text c="dimmed">This page is for Limitbook administrators. Ask one if you need something changed here.</Text>
      <Button component={Link} to={paths.library.home.getHref()} variant="default">
        Back to the library
      </Button>
    </Stack>
  );
}
