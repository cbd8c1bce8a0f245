import { Alert, Button } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import { errorMessage } from '@/components/form/server-errors';

/** Fallback for one independent panel; the rest of the page stays usable. */
export function PanelError({ error, onRetry, title = 'This panel could not be shown' }: { error: unknown; onRetry?: () => void; title?: string }) {
  return (
    <Alert color="redline" variant="light" icon={<IconAlertTriangle size={18} />} title={title} role="alert">
      {errorMessage(error)}
      {onRetry && (
        <Button display="block" mt="sm" size="xs" variant="default" onClick={onRetry}>
          Try again
        </Button>
      )}
    </Alert>
  );
}
