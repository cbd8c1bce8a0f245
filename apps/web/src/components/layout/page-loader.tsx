import { Center, Loader } from '@mantine/core';

export function PageLoader({ label = 'Loading' }: { label?: string }) {
  return (
    <Center mih="40vh" role="status" aria-label={label}>
      <Loader size="sm" type="dots" />
    </Center>
  );
}
