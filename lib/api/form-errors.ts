import { z } from 'zod';

import { ApiError } from '@/lib/api/fetcher';

/** Errors to show on a form: one message per field name, and one for the form as a whole. */
export type FormErrors = { fields: Record<string, string>; form?: string };

/** No errors at all. */
export const NO_ERRORS: FormErrors = { fields: {} };

const detailSchema = z.array(z.object({ path: z.string(), message: z.string() }));

/** Shared schema messages read after the field's label ("must be at least 10 characters"); start them with a capital. */
export function sentence(message: string): string {
  return message.charAt(0).toUpperCase() + message.slice(1);
}

function collect(list: { path: string; message: string }[], known: readonly string[]): FormErrors {
  const fields: Record<string, string> = {};
  const rest: string[] = [];
  for (const { path, message } of list) {
    if (known.includes(path)) fields[path] ??= sentence(message);
    else rest.push(path ? `${path}: ${message}` : sentence(message));
  }
  return rest.length > 0 ? { fields, form: rest.join('; ') } : { fields };
}

/** Checks form values with a shared schema; on failure, the messages keyed by field. */
export function checkForm<S extends z.ZodType>(
  schema: S,
  values: unknown,
  known: readonly string[],
): { ok: true; data: z.infer<S> } | { ok: false; errors: FormErrors } {
  const parsed = schema.safeParse(values);
  if (parsed.success) return { ok: true, data: parsed.data };
  const list = parsed.error.issues.map((issue) => ({ path: issue.path.join('.'), message: issue.message }));
  return { ok: false, errors: collect(list, known) };
}

/** Turns a failed request into form errors: validation details beside their fields, anything else for the form. */
export function errorsFromApi(error: unknown, known: readonly string[]): FormErrors {
  if (!(error instanceof ApiError)) {
    return { fields: {}, form: error instanceof Error ? error.message : 'Something went wrong.' };
  }
  if (error.code === 'validation_failed') {
    const details = detailSchema.safeParse(error.details);
    if (details.success && details.data.length > 0) return collect(details.data, known);
  }
  return { fields: {}, form: error.message };
}
