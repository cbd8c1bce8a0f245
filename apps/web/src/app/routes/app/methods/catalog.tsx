import { Stack } from '@mantine/core';
import { useDocumentTitle } from '@mantine/hooks';
import { MethodDesignDrafts } from '@/features/method-designer/components/method-design-drafts';
import { MethodsCatalog } from '@/features/methods/components/methods-catalog';
import { canAccess } from '@/lib/authorization';
import { useSessionUser } from '@/lib/session';

export function MethodsCatalogRoute() {
  useDocumentTitle('Methods · Limitbook');
  const user = useSessionUser();
  const canDesign = canAccess(user.role, 'standards.edit');
  const canReview = canAccess(user.role, 'standards.review');
  return (
    <Stack gap="xl">
      <MethodsCatalog canDesign={canDesign} />
      {(canDesign || canReview) && <MethodDesignDrafts />}
    </Stack>
  );
}
