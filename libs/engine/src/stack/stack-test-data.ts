// Shared by the stack specs only; not exported from the library.
import type { StackContributor } from '@limitbook/contracts';
import fc from 'fast-check';

/** Gap = bore depth − spacer − ring − shoulder (Limitbook reference §7 example). */
export const gapStack: { contributors: StackContributor[] } = {
  contributors: [
    { name: 'bore depth', sense: 1, nominal: 40, plusTol: 0.1, minusTol: 0.1, distribution: 'normal' },
    { name: 'spacer', sense: -1, nominal: 25, plusTol: 0.05, minusTol: 0.05, distribution: 'normal' },
    { name: 'ring', sense: -1, nominal: 2, plusTol: 0.03, minusTol: 0.03, distribution: 'normal' },
    { name: 'shoulder', sense: -1, nominal: 10, plusTol: 0.05, minusTol: 0.05, distribution: 'normal' },
  ],
};

export const withDistribution = (distribution: StackContributor['distribution']) => ({
  contributors: gapStack.contributors.map((contributor) => ({ ...contributor, distribution })),
});

const tolerance = fc.integer({ min: 0, max: 500 }).map((micrometres) => micrometres / 1000);

export const randomContributor: fc.Arbitrary<StackContributor> = fc.record({
  name: fc.constantFrom('a', 'b', 'c', 'd'),
  sense: fc.constantFrom(1 as const, -1 as const),
  nominal: fc.integer({ min: 0, max: 200_000 }).map((micrometres) => micrometres / 1000),
  plusTol: tolerance,
  minusTol: tolerance,
  distribution: fc.constantFrom('normal' as const, 'uniform' as const, 'triangular' as const),
});

export const randomContributors = fc.array(randomContributor, { minLength: 1, maxLength: 20 });
