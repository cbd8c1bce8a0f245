import type { DerivationStep } from '@limitbook/contracts';
import { Tex } from '@/components/math/tex';
import classes from './derivation-steps.module.css';

/** The worked derivation, one numbered step per line: label, the formula with numbers substituted, the value. */
export function DerivationSteps({ steps, references }: { steps: DerivationStep[]; references?: string[] }) {
  return (
    <div className={classes.root}>
      <ol className={classes.steps}>
        {steps.map((step, index) => (
          <li key={index} className={classes.step}>
            <div className={classes.label}>{step.label}</div>
            <Tex latex={step.latex} display className={classes.formula} />
            <div className={classes.value}>{step.value}</div>
          </li>
        ))}
      </ol>
      {references && references.length > 0 && (
        <div className={classes.references}>
          <span className={classes.referencesTitle}>Method references</span>
          <ul>
            {references.map((reference, index) => (
              <li key={index}>{reference}</li>
            ))}
          </ul>
        </div>
      )}
    </div>
  );
}
