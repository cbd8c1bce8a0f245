/**
 * P(Z > z) for a standard normal Z, accurate to a relative 1.2·10⁻⁷ deep into the tails, where
 * 1 − Φ(z) computed by subtraction would lose every digit (ppm at Cpk 2 is 10⁻⁹).
 */
export function normalTailProbability(z: number): number {
  if (Number.isNaN(z)) return Number.NaN;
  return 0.5 * complementaryErrorFunction(z / Math.SQRT2);
}

// Chebyshev fit of erfc (Press et al., Numerical Recipes in C, 2nd ed., §6.2, erfcc).
function complementaryErrorFunction(x: number): number {
  const z = Math.abs(x);
  const t = 1 / (1 + 0.5 * z);
  const tail =
    t *
    Math.exp(
      -z * z -
        1.26551223 +
        t *
          (1.00002368 +
            t *
              (0.37409196 +
                t *
                  (0.09678418 +
                    t * (-0.18628806 + t * (0.27886807 + t * (-1.13520398 + t * (1.48851587 + t * (-0.82215223 + t * 0.17087277)))))))),
    );
  return x >= 0 ? tail : 2 - tail;
}
