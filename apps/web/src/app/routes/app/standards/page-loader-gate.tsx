import { Anchor, Stack, Text, Title } from '@mantine/core';
import type { Page } from '@limitbook/contracts';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { PanelError } from '@/components/errors/panel-error';
import { PageLoader } from '@/components/layout/page-loader';
import { paths } from '@/config/paths';
import { usePage } from '@/features/standards/api/get-page';
import { isApiError } from '@/lib/api-client';

/** Loads a standard by document number for the screens around it (history, compare), with the page's own not-found. */
export function WithStandard({ documentNumber, children }: { documentNumber: string; children: (page: Page) => ReactNode }) {
  const page = usePage(documentNumber, 'released');
  if (page.isPending) return <PageLoader />;
  if (page.isError) {
    if (isApiError(page.error) && (page.error.status === 404 || page.error.status === 400)) {
      return (
        <Stack gap="sm" maw={640}>
          <Title order={1}>No standard {documentNumber}</Title>
          <Text>
            There is no standard with this number you can see. Go back to the <Anchor component={Link} to={paths.library.home.getHref()}>library</Anchor>.
          </Text>
        </Stack>
      );
    }
    return <PanelError error={page.error} onRetry={() => void page.refetch()} title={`${documentNumber} could not be loaded`} />;
  }
  return <>{children(page.data)}</>;
}
