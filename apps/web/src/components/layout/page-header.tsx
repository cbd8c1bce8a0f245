import { Group, Stack, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';
import classes from './page-header.module.css';

type Props = { eyebrow?: string; title: string; description?: ReactNode; actions?: ReactNode };

export function PageHeader({ eyebrow, title, description, actions }: Props) {
  return (
    <header className={classes.header}>
      <Group justify="space-between" align="flex-end" gap="md" wrap="wrap">
        <Stack gap={6} maw={720}>
          {eyebrow && <Text className={classes.eyebrow}>{eyebrow}</Text>}
          <Title order={1}>{title}</Title>
          {description && <Text c="dimmed">{description}</Text>}
        </Stack>
        {actions && <Group gap="sm">{actions}</Group>}
      </Group>
    </header>
  );
}
