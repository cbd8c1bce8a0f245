import { isApiError } from '@/lib/api-client';

type FormLike = { setErrors: (errors: Record<string, string>) => void };

/**
 * Puts the server's per-field messages on the matching inputs and returns what is left to show
 * above the form: the general message, or messages about fields the form does not have.
 */
export function applyServerErrors(form: FormLike, error: unknown, formFields: readonly string[]): string | null {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  const known: Record<string, string> = {};
  const leftover: string[] = [];
  for (const [path, message] of Object.entries(error.fields)) {
    if (formFields.includes(path)) known[path] = message;
    else leftover.push(message);
  }
  form.setErrors(known);
  if (Object.keys(known).length > 0 && leftover.length === 0) return null;
  // Messages about fields the form lacks (a link's token, say) read as a follow-up to the main one.
  return [error.message, ...leftover.map((line) => (/[.!?]$/.test(line) ? line : `${line}.`))].join(' ');
}

/** A short, human description of an error for notifications and panels. */
export function errorMessage(error: unknown): string {
  if (isApiError(error)) return error.message;
  if (error instanceof Error && error.message) return error.message;
  return 'Something went wrong. Try again.';
}
