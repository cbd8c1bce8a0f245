import { houseMethodPrefix, isHouseMethodId } from '@limitbook/contracts';

/** The designer's slug of an in-house method id, or null for built-in methods. */
export function slugOf(methodId: string): string | null {
  return isHouseMethodId(methodId) ? methodId.slice(houseMethodPrefix.length) : null;
}
