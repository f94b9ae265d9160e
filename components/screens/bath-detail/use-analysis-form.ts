import { useState } from 'react';

import { todayText } from '@/components/screens/bath-detail/bath-words';
import { NOT_A_NUMBER, readNumber } from '@/components/screens/library/number-text';
import { checkForm, errorsFromApi, NO_ERRORS, type FormErrors } from '@/lib/api/form-errors';
import { useAddAnalysis } from '@/lib/api/use-bath-detail';
import { unitOf } from '@/lib/baths/quantities';
import { analysisInputSchema, type Analysis, type AnalysisInput, type Bath, type BathUnit, type Quantity } from '@/shared/baths';

/** Quantities entered with a unit (everything but pH). */
export type Measured = Exclude<Quantity, 'pH'>;

/** The measured quantities this bath's form asks for: metal, free and total ligand, and its extras. */
export function measuredOf(bath: Pick<Bath, 'extras'>): Measured[] {
  return ['metal', 'freeLigand', 'totalLigand', ...bath.extras];
}

/** Every path an error may be reported on, so server and schema messages land beside their fields. */
const KNOWN: readonly string[] = [
  'sampledAt',
  'analyst',
  'notes',
  'pH',
  ...(['metal', 'freeLigand', 'totalLigand', 'carbonate', 'bromide'] as const).flatMap((q) => [q, `${q}.value`, `${q}.unit`]),
];

/** The error to show beside a measured quantity's field, whichever part it was reported on. */
export function measuredError(errors: FormErrors, q: Measured): string | undefined {
  return errors.fields[`${q}.value`] ?? errors.fields[`${q}.unit`] ?? errors.fields[q];
}

type Texts = { sampledAt: string; analyst: string; pH: string; notes: string; values: Partial<Record<Measured, string>> };

function unitsOf(bath: Bath): Record<Measured, BathUnit> {
  const u = (q: Measured) => unitOf(bath, q) as BathUnit;
  return { metal: u('metal'), freeLigand: u('freeLigand'), totalLigand: u('totalLigand'), carbonate: u('carbonate'), bromide: u('bromide') };
}

/** Reads the typed texts into an AnalysisInput, with "Enter a number" for texts that are not numbers. */
function readTexts(texts: Texts, units: Record<Measured, BathUnit>, measured: readonly Measured[]): { input: Record<string, unknown>; bad: Record<string, string> } {
  const input: Record<string, unknown> = { sampledAt: texts.sampledAt.trim(), analyst: texts.analyst, notes: texts.notes };
  const bad: Record<string, string> = {};
  for (const q of measured) {
    const read = readNumber(texts.values[q] ?? '', 'default');
    if (read.bad) bad[`${q}.value`] = NOT_A_NUMBER;
    else if (typeof read.value === 'number') input[q] = { value: read.value, unit: units[q] };
  }
  const ph = readNumber(texts.pH, 'default');
  if (ph.bad) bad.pH = NOT_A_NUMBER;
  else if (typeof ph.value === 'number') input.pH = ph.value;
  // The server refuses a future date; saying so here saves a round trip.
  if (/^\d{4}-\d{2}-\d{2}$/.test(texts.sampledAt.trim()) && texts.sampledAt.trim() > todayText()) bad.sampledAt = 'Cannot be in the future';
  return { input, bad };
}

/** State of the add-an-analysis form: texts, units (the bath's by default), errors, and saving. */
export function useAnalysisForm(bath: Bath, analystName: string) {
  const measured = measuredOf(bath);
  const add = useAddAnalysis(bath.id);
  const [texts, setTexts] = useState<Texts>({ sampledAt: todayText(), analyst: analystName, pH: '', notes: '', values: {} });
  const [units, setUnits] = useState<Record<Measured, BathUnit>>(() => unitsOf(bath));
  const [errors, setErrors] = useState<FormErrors>(NO_ERRORS);
  const [saved, setSaved] = useState<Analysis | null>(null);

  const set = (field: 'sampledAt' | 'analyst' | 'pH' | 'notes') => (text: string) => setTexts((t) => ({ ...t, [field]: text }));
  const setValue = (q: Measured) => (text: string) => setTexts((t) => ({ ...t, values: { ...t.values, [q]: text } }));
  const setUnit = (q: Measured) => (unit: BathUnit) => setUnits((u) => ({ ...u, [q]: unit }));

  const submit = async () => {
    if (add.isMutating) return;
    setSaved(null);
    const { input, bad } = readTexts(texts, units, measured);
    const checked = checkForm(analysisInputSchema, input, KNOWN);
    const found = checked.ok ? NO_ERRORS : checked.errors;
    if (!checked.ok || Object.keys(bad).length > 0) {
      setErrors({ ...found, fields: { ...found.fields, ...bad } });
      return;
    }
    setErrors(NO_ERRORS);
    try {
      const analysis = await add.trigger(checked.data as AnalysisInput);
      setSaved(analysis);
      // The date and analyst stay for the next sample of the same round.
      setTexts((t) => ({ ...t, pH: '', notes: '', values: {} }));
    } catch (error) {
      setErrors(errorsFromApi(error, KNOWN));
    }
  };

  return { measured, texts, units, errors, saved, saving: add.isMutating, set, setValue, setUnit, submit };
}

/** What the add-an-analysis form reads and calls. */
export type AnalysisFormState = ReturnType<typeof useAnalysisForm>;
