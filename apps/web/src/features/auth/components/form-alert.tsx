import { Alert } from '@mantine/core';
import { IconAlertCircle, IconInfoCircle } from '@tabler/icons-react';
import type { ReactNode } from 'react';

export function FormAlert({ children, tone = 'error' }: { children: ReactNode; tone?: 'error' | 'info' }) {
  return (
    <Alert
      role={tone === 'error' ? 'alert' : 'status'}
      color={tone === 'error' ? 'redline' : 'ink'}
      variant="light"
      icon={tone === 'error' ? <IconAlertCircle size={18} /> : <IconInfoCircle size={18} />}
      mb="md"
    >
      {children}
    </Alert>
  );
}
