import type { ZodError } from 'zod';

/** Maps zod issues to { 'field.path': 'message naming the rule' } (first issue per field). */
export function fieldErrors(error: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_';
    if (!(key in fields)) fields[key] = issue.message;
  }
  return fields;
}
