// Where an error belongs on a calculator screen: beside a system field (totals.Ag+, pH), beside one
// of the calculator's own fields (solid, from), or at the top. Server details and the calculators'
// CalculatorInputError name the field in slightly different ways; this reads them all.
import { ApiError } from '@/lib/api/fetcher';
import { errorsFromApi, sentence, type FormErrors } from '@/lib/api/form-errors';
import { CalculatorInputError } from '@/lib/calculators/errors';

/** Errors sorted by where they are shown. */
export type PlacedErrors = {
  system: FormErrors;
  params: Record<string, string>;
  /** The run's title (saving only). */
  title?: string;
  /** For the top of the screen. */
  top?: string;
};

/** How a screen names its fields. */
export type FieldNames = {
  /** Field names of the system form (use-system-form knownFields()). */
  system: readonly string[];
  /** The calculator's own fields that show errors. */
  params: readonly string[];
  /** Engine field to param field (default: as is). */
  paramField?: (field: string) => string;
};

const SYSTEM_ROOT = /^(totals|fixed|components|species|solids|pH|temperatureC|metals|ligands|counterIons|activity|includeDrafts)\b/;

function joinTop(a: string | undefined, b: string | undefined): string | undefined {
  return a && b ? `${a}; ${b}` : (a ?? b);
}

/** Puts one field's message where it belongs. */
export function placeField(field: string, message: string, names: FieldNames, into: PlacedErrors): void {
  const text = sentence(message);
  if (field === 'title') {
    into.title = text;
    return;
  }
  const inSystem = field.replace(/^(system|state)\./, '');
  if (field.startsWith('system.') || field.startsWith('state.') || SYSTEM_ROOT.test(field)) {
    if (names.system.includes(inSystem)) into.system.fields[inSystem] ??= text;
    else into.top = joinTop(into.top, `${inSystem}: ${message}`);
    return;
  }
  const raw = field.replace(/^params\./, '');
  const param = names.paramField ? names.paramField(raw) : raw;
  if (names.params.includes(param)) into.params[param] ??= text;
  else into.top = joinTop(into.top, field === 'bathId' ? `The bath: ${message}` : `${raw}: ${message}`);
}

function empty(): PlacedErrors {
  return { system: { fields: {} }, params: {} };
}

/** A calculator's refusal (CalculatorInputError) beside its field, or anything else at the top in words. */
export function placeCalculatorError(error: unknown, names: FieldNames): PlacedErrors {
  const out = empty();
  if (error instanceof CalculatorInputError) {
    const message = error.message.startsWith(`${error.field}: `) ? error.message.slice(error.field.length + 2) : error.message;
    placeField(error.field, message, names, out);
  } else {
    out.top = error instanceof Error ? error.message : 'The calculation could not be worked out.';
  }
  return out;
}

/** A failed request: validation details beside their fields (system.*, params.*, title, bathId), the rest at the top. */
export function placeApiError(error: unknown, names: FieldNames): PlacedErrors {
  const out = empty();
  if (error instanceof ApiError && error.code === 'validation_failed' && Array.isArray(error.details) && error.details.length > 0) {
    for (const d of error.details as { path?: unknown; message?: unknown }[]) {
      if (typeof d.path === 'string' && typeof d.message === 'string') placeField(d.path, d.message, names, out);
    }
    if (Object.keys(out.system.fields).length > 0 || Object.keys(out.params).length > 0 || out.title || out.top) return out;
  }
  const plain = errorsFromApi(error, names.system);
  return { ...out, top: plain.form, system: { fields: plain.fields } };
}

/** Zod-style issues of the params (path without "params.") beside their fields. */
export function placeParamIssues(issues: readonly { path: readonly PropertyKey[]; message: string }[], names: FieldNames): PlacedErrors {
  const out = empty();
  for (const issue of issues) placeField(`params.${issue.path.map(String).join('.')}`, issue.message, names, out);
  return out;
}
