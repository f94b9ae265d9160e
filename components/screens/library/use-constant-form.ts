import { useRouter } from 'expo-router';
import { useState } from 'react';
import { type z } from 'zod';

import { NOT_A_NUMBER, numberText, readNumber, type EmptyMeans } from '@/components/screens/library/number-text';
import { constantHref } from '@/components/screens/library/words';
import { checkForm, errorsFromApi, NO_ERRORS, type FormErrors } from '@/lib/api/form-errors';
import { type ConstantKind, type ConstantSummary } from '@/shared/constants';

/** Everything the propose and revise forms hold, as typed (numbers are text until sent). */
export type FormTexts = {
  kind: ConstantKind | null;
  reaction: string;
  logValue: string;
  uncertainty: string;
  temperatureC: string;
  ionicStrength: string;
  medium: string;
  enthalpyKjMol: string;
  source: string;
  note: string;
};
type TextField = Exclude<keyof FormTexts, 'kind'>;

/** Field names, as the schemas and the server's validation details name them. */
export const FORM_FIELDS = [
  'kind',
  'reaction',
  'logValue',
  'uncertainty',
  'temperatureC',
  'ionicStrength',
  'medium',
  'enthalpyKjMol',
  'source',
  'note',
] as const;

/** Words for each field in the summary at the top of a form with mistakes. */
export const FIELD_NAMES: Record<(typeof FORM_FIELDS)[number], string> = {
  kind: 'Kind',
  reaction: 'Reaction',
  logValue: 'Log value',
  uncertainty: 'Uncertainty',
  temperatureC: 'Temperature',
  ionicStrength: 'Ionic strength',
  medium: 'Medium',
  enthalpyKjMol: 'Enthalpy',
  source: 'Source',
  note: 'Note',
};

const NUMBER_FIELDS: readonly [TextField, EmptyMeans][] = [
  ['logValue', 'required'],
  ['uncertainty', 'null'],
  ['temperatureC', 'default'],
  ['ionicStrength', 'default'],
  ['enthalpyKjMol', 'null'],
];

/** A blank proposal at the usual conditions: 25 °C, ionic strength 0. */
export const BLANK_FORM: FormTexts = {
  kind: null,
  reaction: '',
  logValue: '',
  uncertainty: '',
  temperatureC: '25',
  ionicStrength: '0',
  medium: '',
  enthalpyKjMol: '',
  source: '',
  note: '',
};

/** A revision starts from the version it replaces; the note starts empty because it says what changed. */
export function textsFrom(c: ConstantSummary): FormTexts {
  return {
    kind: c.kind,
    reaction: c.reaction,
    logValue: numberText(c.logValue),
    uncertainty: numberText(c.uncertainty),
    temperatureC: numberText(c.temperatureC),
    ionicStrength: numberText(c.ionicStrength),
    medium: c.medium,
    enthalpyKjMol: numberText(c.enthalpyKjMol),
    source: c.source,
    note: '',
  };
}

function readForm(texts: FormTexts): { values: Record<string, unknown>; bad: Record<string, string> } {
  const values: Record<string, unknown> = { ...texts, kind: texts.kind ?? undefined };
  const bad: Record<string, string> = {};
  for (const [field, empty] of NUMBER_FIELDS) {
    const read = readNumber(texts[field], empty);
    values[field] = read.value;
    if (read.bad) bad[field] = NOT_A_NUMBER;
  }
  return { values, bad };
}

type Options<S extends z.ZodType> = {
  initial: FormTexts;
  schema: S;
  send: (values: z.infer<S>) => Promise<ConstantSummary>;
};

/** State, checks and submission of the propose and revise forms; on success it opens the new draft. */
export function useConstantForm<S extends z.ZodType>({ initial, schema, send }: Options<S>) {
  const router = useRouter();
  const [texts, setTexts] = useState<FormTexts>(initial);
  const [errors, setErrors] = useState<FormErrors>(NO_ERRORS);

  const submit = async () => {
    const { values, bad } = readForm(texts);
    const check = checkForm(schema, values, FORM_FIELDS);
    const fields = { ...(check.ok ? {} : check.errors.fields), ...bad };
    if (fields.kind) fields.kind = 'Choose the kind of constant';
    if (!check.ok || Object.keys(bad).length > 0) {
      setErrors({ fields, form: check.ok ? undefined : check.errors.form });
      return;
    }
    setErrors(NO_ERRORS);
    try {
      const draft = await send(check.data);
      router.replace(constantHref(draft.id));
    } catch (error) {
      setErrors(errorsFromApi(error, FORM_FIELDS));
    }
  };

  return {
    texts,
    errors,
    set: (field: TextField) => (value: string) => setTexts((now) => ({ ...now, [field]: value })),
    setKind: (kind: ConstantKind) => setTexts((now) => ({ ...now, kind })),
    submit,
  };
}

/** What useConstantForm hands to the form's fields. */
export type ConstantFormState = ReturnType<typeof useConstantForm>;
