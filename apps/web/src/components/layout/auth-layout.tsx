import { Anchor, Box, Stack, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { DrawingMotif } from '@/components/brand/drawing-motif';
import { Logo } from '@/components/brand/logo';
import { paths } from '@/config/paths';
import classes from './auth-layout.module.css';

type Props = { title: string; description?: ReactNode; children: ReactNode };

/** Sign-in and account pages: a drawing sheet beside the form. */
export function AuthLayout({ title, description, children }: Props) {
  return (
    <div className={classes.root}>
      <aside className={classes.aside}>
        <Logo tone="light" size={30} />
        <Box className={classes.motif}>
          <DrawingMotif />
        </Box>
        <Stack gap="xs" className={classes.pitch}>
          <Text className={classes.tagline}>Your team&rsquo;s tolerancing rules, and the calculators that hold them.</Text>
          <Text className={classes.subline}>
            Standards pages with calculator blocks evaluated on the server, revision by revision.
          </Text>
        </Stack>
      </aside>
      <main className={classes.main}>
        <div className={classes.mobileLogo}>
          <Anchor component={Link} to={paths.root.getHref()} underline="never" aria-label="Limitbook home">
            <Logo size={26} />
          </Anchor>
        </div>
        <div className={classes.panel}>
          <Title order={1} className={classes.title}>
            {title}
          </Title>
          {description && (
            <Text c="dimmed" mt={6} mb="lg">
              {description}
            </Text>
          )}
          {!description && <Box mb="lg" />}
          {children}
        </div>
      </main>
    </div>
  );
}
