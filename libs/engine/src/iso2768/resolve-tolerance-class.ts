import { EngineError } from '../core/engine-error.js';
import { parseGeneralToleranceDesignation } from './parse-general-tolerance-designation.js';

/**
 * The class to use, from the explicit `class` input or the title-block designation; they must agree
 * when both are given. `part` picks the part-1 (f/m/c/v) or part-2 (H/K/L) letter of the designation.
 */
export function resolveToleranceClass<TClass extends string>(
  inputs: { class?: TClass; designation?: string },
  part: 'linear' | 'geometric',
): { toleranceClass: TClass; envelope: boolean } {
  const designationText = inputs.designation?.trim() ?? '';
  if (designationText === '') return { toleranceClass: inputs.class as TClass, envelope: false };

  const parsed = parseGeneralToleranceDesignation(designationText);
  if (!parsed.ok) throw EngineError.invalid({ designation: parsed.message });
  const fromDesignation = (part === 'linear' ? parsed.value.linearClass : parsed.value.geometricClass) as TClass | undefined;
  if (fromDesignation === undefined && inputs.class === undefined) {
    const missing = part === 'linear' ? 'a linear class (f, m, c or v) of ISO 2768-1' : 'a geometric class (H, K or L) of ISO 2768-2';
    throw EngineError.invalid({ designation: `"${designationText}" gives no ${missing}` });
  }
  if (fromDesignation !== undefined && inputs.class !== undefined && fromDesignation !== inputs.class) {
    throw EngineError.invalid({ class: `Class ${inputs.class} contradicts the designation "${designationText}" (class ${fromDesignation})` });
  }
  return { toleranceClass: (fromDesignation ?? inputs.class) as TClass, envelope: parsed.value.envelope };
}
