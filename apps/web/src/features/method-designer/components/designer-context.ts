import type { DesignDefinition } from '@limitbook/contracts';
import type { UseFormReturnType } from '@mantine/form';

/** What every section of the designer reads: the form, the server's messages by field and the TeX of each expression. */
export type DesignerSection = {
  form: UseFormReturnType<DesignDefinition>;
  /** Server messages by field path (`outputs.0.expression`), from the live preview or a refused save. */
  problems: Record<string, string>;
  tex: Record<string, string>;
  readOnly: boolean;
};

export function errorAt(section: DesignerSection, path: string): string | undefined {
  const own = section.form.errors[path];
  return (typeof own === 'string' ? own : undefined) ?? section.problems[path];
}
