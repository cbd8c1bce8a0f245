import { fieldMessages } from '@limitbook/contracts';
import { type z } from 'zod';

/**
 * One message per field. Unknown keys are reported under their own names rather than
 * the object's path, so a form can point at the field it should not have sent.
 */
export function validationFields(error: z.ZodError): Record<string, string> {
  const issues: z.core.$ZodIssue[] = [];
  for (const issue of error.issues) {
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) issues.push({ ...issue, path: [...issue.path, key], message: 'Unknown field' });
    } else {
      issues.push(issue);
    }
  }
  return fieldMessages({ issues } as z.ZodError);
}
