import type { MethodUsage } from '@limitbook/contracts';

/** The number of different pages a method's blocks sit on. */
export function pageCount(usages: readonly MethodUsage[]): number {
  return new Set(usages.map((usage) => usage.pageId)).size;
}

/** Blocks pinned to a released version older than the latest one. */
export function laggingUsages(usages: readonly MethodUsage[], latestVersion: number): MethodUsage[] {
  return usages.filter((usage) => usage.methodVersion !== null && usage.methodVersion < latestVersion);
}
