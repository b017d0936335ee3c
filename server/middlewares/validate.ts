import type { ZodError } from 'zod';

/**
 * Maps zod issues to { 'field.path': 'message naming the rule' } (first issue per field). A key a
 * strict schema does not know is named as its own field, so a misspelt PATCH field is not lost
 * silently.
 */
export function fieldErrors(error: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  const put = (path: PropertyKey[], message: string) => {
    const key = path.length ? path.map(String).join('.') : '_';
    if (!(key in fields)) fields[key] = message;
  };
  for (const issue of error.issues) {
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) put([...issue.path, key], 'Not a field of this request');
    } else put(issue.path, issue.message);
  }
  return fields;
}
