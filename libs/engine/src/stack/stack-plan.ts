import type { StackContributor } from '@limitbook/contracts';

export type StackDistribution = StackContributor['distribution'];

/** A contributor centred in its limits: plain data, so a plan can be posted to a worker thread. */
export interface PlannedContributor {
  name: string;
  sense: 1 | -1;
  nominal: number;
  /** Middle of the limits: nominal + (plusTol − minusTol)/2. */
  centre: number;
  /** Half the spread between the limits: (plusTol + minusTol)/2. */
  halfBand: number;
  distribution: StackDistribution;
  /** Standard deviation of the contributor's distribution. */
  sigma: number;
}

export interface StackPlan {
  contributors: PlannedContributor[];
  lowerSpec?: number;
  upperSpec?: number;
}

export interface StackPlanInputs {
  contributors: StackContributor[];
  lowerSpec?: number | undefined;
  upperSpec?: number | undefined;
}

/**
 * Centres each contributor in its limits (the usual practice with unequal tolerances) and gives
 * each its σ: normal σ = half band/(3·Cpk) (Cpk 1 when not stated) or the stated σ; uniform
 * σ = half band/√3; symmetric triangular σ = half band/√6.
 */
export function planStack(inputs: StackPlanInputs): StackPlan {
  const contributors = inputs.contributors.map((contributor): PlannedContributor => {
    const halfBand = (contributor.plusTol + contributor.minusTol) / 2;
    return {
      name: contributor.name,
      sense: contributor.sense,
      nominal: contributor.nominal,
      centre: contributor.nominal + (contributor.plusTol - contributor.minusTol) / 2,
      halfBand,
      distribution: contributor.distribution,
      sigma: contributorSigma(contributor, halfBand),
    };
  });
  return {
    contributors,
    ...(inputs.lowerSpec !== undefined ? { lowerSpec: inputs.lowerSpec } : {}),
    ...(inputs.upperSpec !== undefined ? { upperSpec: inputs.upperSpec } : {}),
  };
}

function contributorSigma(contributor: StackContributor, halfBand: number): number {
  switch (contributor.distribution) {
    case 'normal':
      return contributor.sigma ?? halfBand / (3 * (contributor.cpk ?? 1));
    case 'uniform':
      return halfBand / Math.sqrt(3);
    case 'triangular':
      return halfBand / Math.sqrt(6);
  }
}
