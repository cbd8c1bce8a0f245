import { AppShell, Avatar, Badge, Burger, Group, Menu, NavLink, Stack, Text, UnstyledButton } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { roleLabels, type SessionUser } from '@limitbook/contracts';
import { IconBooks, IconChevronDown, IconFileCertificate, IconMathFunction, IconLogout, IconMail, IconListDetails, IconUsers, type Icon } from '@tabler/icons-react';
import { useEffect, type ReactNode } from 'react';
import { Link, useLocation } from 'react-router-dom';
import { Logo } from '@/components/brand/logo';
import { paths } from '@/config/paths';
import { canAccess, type Area } from '@/lib/authorization';
import classes from './app-layout.module.css';

type NavItem = { label: string; href: string; area: Area; icon: Icon };
type NavSection = { label: string; items: NavItem[] };

const sections: NavSection[] = [
  {
    label: 'Knowledge',
    items: [
      { label: 'Library', href: paths.library.home.getHref(), area: 'library', icon: IconBooks },
      { label: 'My records', href: paths.records.list.getHref(), area: 'library', icon: IconFileCertificate },
      { label: 'Methods', href: paths.methods.catalog.getHref(), area: 'library', icon: IconMathFunction },
    ],
  },
  {
    label: 'Admin',
    items: [
      { label: 'Users', href: paths.admin.users.getHref(), area: 'admin.users', icon: IconUsers },
      { label: 'Mail', href: paths.admin.mail.getHref(), area: 'admin.mail', icon: IconMail },
      { label: 'Audit log', href: paths.admin.audit.getHref(), area: 'admin.audit', icon: IconListDetails },
    ],
  },
];

function initials(name: string) {
  const parts = name.trim().split(/\s+/);
  return ((parts[0]?.[0] ?? '') + (parts.length > 1 ? (parts.at(-1)?.[0] ?? '') : '')).toUpperCase() || '?';
}

type Props = { user: SessionUser; onSignOut: () => void; children: ReactNode };

export function AppLayout({ user, onSignOut, children }: Props) {
  const [opened, { toggle, close }] = useDisclosure(false);
  const { pathname } = useLocation();
  useEffect(close, [pathname, close]);

  const visible = sections
    .map((section) => ({ ...section, items: section.items.filter((item) => canAccess(user.role, item.area)) }))
    .filter((section) => section.items.length > 0);

  return (
    <AppShell
      header={{ height: 56 }}
      navbar={{ width: 240, breakpoint: 'sm', collapsed: { mobile: !opened } }}
      padding={0}
      classNames={{ header: classes.header, navbar: classes.navbar, main: classes.main }}
    >
      <AppShell.Header>
        <Group h="100%" px="md" justify="space-between" wrap="nowrap">
          <Group gap="sm" wrap="nowrap">
            <Burger opened={opened} onClick={toggle} hiddenFrom="sm" size="sm" aria-label={opened ? 'Close navigation' : 'Open navigation'} />
            <Link to={paths.library.home.getHref()} className={classes.home} aria-label="Limitbook, go to the library">
              <Logo size={26} />
            </Link>
          </Group>
          <Menu position="bottom-end" width={240} shadow="md">
            <Menu.Target>
              <UnstyledButton className={classes.userButton} aria-label={`Account menu for ${user.name}`}>
                <Group gap={10} wrap="nowrap">
                  <Avatar size={32} radius="xl" color="ink" variant="filled">
                    {initials(user.name)}
                  </Avatar>
                  <Stack gap={0} visibleFrom="xs" className={classes.userText}>
                    <Text size="sm" fw={600} lh={1.2} truncate>
                      {user.name}
                    </Text>
                    <Text size="xs" c="dimmed" lh={1.2}>
                      {roleLabels[user.role]}
                    </Text>
                  </Stack>
                  <IconChevronDown size={14} aria-hidden />
                </Group>
              </UnstyledButton>
            </Menu.Target>
            <Menu.Dropdown>
              <Menu.Label>Signed in as</Menu.Label>
              <Stack gap={4} px="sm" pb="xs">
                <Text size="sm" fw={600}>
                  {user.name}
                </Text>
                <Text size="xs" c="dimmed" truncate>
                  {user.email}
                </Text>
                <Badge color="ink" w="fit-content">
                  {roleLabels[user.role]}
                </Badge>
              </Stack>
              <Menu.Divider />
              <Menu.Item leftSection={<IconLogout size={16} />} onClick={onSignOut}>
                Sign out
              </Menu.Item>
            </Menu.Dropdown>
          </Menu>
        </Group>
      </AppShell.Header>

      <AppShell.Navbar p="sm" aria-label="Main navigation" component="nav">
        {visible.map((section) => (
          <div key={section.label} className={classes.section}>
            <Text className={classes.sectionLabel} id={`nav-${section.label}`}>
              {section.label}
            </Text>
            <ul aria-labelledby={`nav-${section.label}`} className={classes.list}>
              {section.items.map((item) => {
                const active = pathname === item.href || pathname.startsWith(`${item.href}/`);
                return (
                  <li key={item.href}>
                    <NavLink
                      component={Link}
                      to={item.href}
                      label={item.label}
                      active={active}
                      aria-current={active ? 'page' : undefined}
                      leftSection={<item.icon size={18} stroke={1.6} aria-hidden />}
                      className={classes.link}
                    />
                  </li>
                );
              })}
            </ul>
          </div>
        ))}
      </AppShell.Navbar>

      <AppShell.Main>
        <div className={classes.content}>{children}</div>
      </AppShell.Main>
    </AppShell>
  );
}
