import type { TestRun } from '@limitbook/contracts';

/** Why the method cannot go to review yet, or null when it can. */
export function submitBlocker({ problems, testCount, run, runOutdated }: { problems: Record<string, string>; testCount: number; run: TestRun | null; runOutdated: boolean }): string | null {
  const problemCount = Object.keys(problems).length;
  if (problemCount > 0) return `fix the ${problemCount === 1 ? 'message' : `${problemCount} messages`} at the fields first.`;
  if (testCount === 0) return 'add at least one test row.';
  if (!run || runOutdated) return 'run the tests on the definition as it stands.';
  if (!run.pass) return `${run.failed} test ${run.failed === 1 ? 'row fails' : 'rows fail'}.`;
  return null;
}
