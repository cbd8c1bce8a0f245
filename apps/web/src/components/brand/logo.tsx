import { Group, Text } from '@mantine/core';
import classes from './logo.module.css';

/** The Limitbook mark: an upper and a lower limit with the dimension that lives between them. */
export function LogoMark({ size = 28, tone = 'ink' }: { size?: number; tone?: 'ink' | 'light' }) {
  const plate = tone === 'ink' ? '#1c2f4a' : '#f5f3ed';
  const line = tone === 'ink' ? '#f5f3ed' : '#1c2f4a';
  return (
    <svg width={size} height={size} viewBox="0 0 32 32" aria-hidden="true" focusable="false" className={classes.mark}>
      <rect x="1" y="1" width="30" height="30" rx="5" fill={plate} />
      <path d="M7 8.5h18M7 23.5h18" stroke={line} strokeWidth="2.2" strokeLinecap="round" />
      <path d="M16 11.6v8.8" stroke="#e17050" strokeWidth="2.2" />
      <path d="M13.2 14.3 16 11.2l2.8 3.1M13.2 17.7 16 20.8l2.8-3.1" fill="none" stroke="#e17050" strokeWidth="2.2" strokeLinejoin="round" strokeLinecap="round" />
    </svg>
  );
}

export function Logo({ tone = 'ink', size = 28 }: { tone?: 'ink' | 'light'; size?: number }) {
  return (
    <Group gap={10} wrap="nowrap" className={classes.logo} data-tone={tone}>
      <LogoMark size={size} tone={tone === 'ink' ? 'ink' : 'light'} />
      <Text component="span" className={classes.wordmark} fz={size * 0.72}>
        Limitbook
      </Text>
    </Group>
  );
}
