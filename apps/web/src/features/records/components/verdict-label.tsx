import { Badge } from '@mantine/core';
import type { Verdict } from '@limitbook/contracts';

/** Pass / Fail / No verdict as a small badge, the record lists' and permalink's shared word. */
export function VerdictLabel({ verdict }: { verdict: Verdict | null }) {
  if (!verdict) {
    return (
      <Badge variant="outline" color="gray" radius="xs" style={{ flexShrink: 0, overflow: 'visible' }}>
        No verdict
      </Badge>
    );
  }
  return (
    <Badge variant="filled" color={verdict.pass ? 'verdigris' : 'redline'} radius="xs" data-verdict={verdict.pass ? 'pass' : 'fail'} style={{ flexShrink: 0, overflow: 'visible' }}>
      {verdict.pass ? 'Pass' : 'Fail'}
    </Badge>
  );
}
