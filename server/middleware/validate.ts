import type { z } from 'zod';
import { HttpError } from '../lib/http-error';

/** Parses input with a zod schema; failure → 400 naming each field. */
export function parse<S extends z.ZodType>(schema: S, input: unknown): z.infer<S> {
  const result = schema.safeParse(input ?? {});
  if (result.success) return result.data;
  const fieldErrors: Record<string, string[]> = {};
  const formErrors: string[] = [];
  for (const issue of result.error.issues) {
    const key = issue.path.map(String).join('.');
    if (!key) formErrors.push(issue.message);
    else (fieldErrors[key] ??= []).push(issue.message);
  }
  const named = Object.entries(fieldErrors).map(([field, messages]) => `${field}: ${messages[0]}`);
  const message = [...named, ...formErrors].join('; ') || 'The request is not valid.';
  throw new HttpError(400, 'validation_failed', message, { fieldErrors, formErrors });
}
