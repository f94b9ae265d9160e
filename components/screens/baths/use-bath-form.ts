import { useRouter } from 'expo-router';
import { useRef, useState } from 'react';

import {
  KNOWN_PATHS,
  MAX_MAKE_UP,
  TARGETS,
  readBathForm,
  type BathTexts,
  type MakeUpText,
  type TargetName,
} from '@/components/screens/baths/bath-form-texts';
import { bathHref } from '@/components/screens/baths/bath-words';
import { convertText, type StatedAs } from '@/components/screens/baths/target-units';
import { checkForm, errorsFromApi, NO_ERRORS, type FormErrors } from '@/lib/api/form-errors';
import { metalElement } from '@/lib/baths/quantities';
import { bathInputSchema, PROCESS_INFO, type Bath, type BathInput, type BathUnit, type Process } from '@/shared/baths';

type TextKey = 'name' | 'volume' | 'temperatureC' | 'site' | 'notes';

/** How the metal and the free ligand ranges are stated, for converting them when units change. */
function statements(t: BathTexts): { metal: StatedAs; freeLigand: StatedAs } | null {
  if (!t.process) return null;
  return {
    metal: { unit: t.metalUnit, formula: metalElement(PROCESS_INFO[t.process].metal) },
    freeLigand: { unit: t.ligandUnit, formula: t.ligandAs },
  };
}

function anyTarget(t: BathTexts, names: readonly TargetName[]): boolean {
  return names.some((n) => t.targets[n].min.trim() !== '' || t.targets[n].max.trim() !== '');
}

/** The form after a change of units or ligand salt, with the metal and free ligand ranges converted to match. */
function withConverted(now: BathTexts, next: BathTexts): BathTexts {
  const from = statements(now);
  const to = statements(next);
  if (!from || !to) return next;
  const targets = { ...next.targets };
  for (const q of ['metal', 'freeLigand'] as const) {
    targets[q] = { min: convertText(now.targets[q].min, from[q], to[q]), max: convertText(now.targets[q].max, from[q], to[q]) };
  }
  return { ...next, targets };
}

type Options = { initial: BathTexts; send: (values: BathInput) => Promise<Bath> };

/** State, checks and submission of the bath form; on success it opens the bath. */
export function useBathForm({ initial, send }: Options) {
  const router = useRouter();
  const [texts, setTexts] = useState<BathTexts>(initial);
  const [errors, setErrors] = useState<FormErrors>(NO_ERRORS);
  const [note, setNote] = useState<string | null>(null);
  const nextKey = useRef(initial.makeUp.length);

  const submit = async () => {
    const { values, bad } = readBathForm(texts);
    const check = checkForm(bathInputSchema, values, KNOWN_PATHS);
    const fields = { ...(check.ok ? {} : check.errors.fields), ...bad };
    if (fields.process) fields.process = 'Choose the process';
    if (!check.ok || Object.keys(bad).length > 0) {
      setErrors({ fields, form: check.ok ? undefined : check.errors.form });
      return;
    }
    setErrors(NO_ERRORS);
    try {
      const bath = await send(check.data);
      router.replace(bathHref(bath.id));
    } catch (error) {
      setErrors(errorsFromApi(error, KNOWN_PATHS));
    }
  };

  /** A new process brings its default units and ligand salt; ranges already typed are left for the chemist to check. */
  const setProcess = (process: Process) => {
    if (texts.process === process) return;
    const info = PROCESS_INFO[process];
    const next = { ...texts, process, metalUnit: info.metalUnit, ligandUnit: info.ligandUnit, ligandAs: info.ligandAs };
    const changed =
      texts.metalUnit !== next.metalUnit || texts.ligandUnit !== next.ligandUnit || (texts.ligandAs !== '' && texts.ligandAs !== next.ligandAs);
    setTexts(next);
    setNote(changed && anyTarget(texts, ['metal', 'freeLigand']) ? 'The process set its own units; check the target ranges.' : null);
  };

  /** Units or the ligand salt changed: typed ranges are converted so they mean the same concentration. */
  const setStatement = (patch: Partial<Pick<BathTexts, 'metalUnit' | 'ligandUnit' | 'ligandAs'>>) => {
    const next = withConverted(texts, { ...texts, ...patch });
    const converted = TARGETS.some((t) => next.targets[t].min !== texts.targets[t].min || next.targets[t].max !== texts.targets[t].max);
    setTexts(next);
    setNote(converted ? 'Target ranges converted to the new units.' : null);
  };

  const setLine = (key: number, patch: Partial<Omit<MakeUpText, 'key'>>) =>
    setTexts((now) => ({ ...now, makeUp: now.makeUp.map((l) => (l.key === key ? { ...l, ...patch } : l)) }));

  return {
    texts,
    errors,
    note,
    submit,
    set: (field: TextKey) => (value: string) => setTexts((now) => ({ ...now, [field]: value })),
    setVolumeUnit: (volumeUnit: BathTexts['volumeUnit']) => setTexts((now) => ({ ...now, volumeUnit })),
    setProcess,
    setMetalUnit: (metalUnit: BathUnit) => setStatement({ metalUnit }),
    setLigandUnit: (ligandUnit: BathUnit) => setStatement({ ligandUnit }),
    setLigandAs: (ligandAs: string) => setStatement({ ligandAs }),
    setTarget: (name: TargetName, end: 'min' | 'max') => (value: string) =>
      setTexts((now) => ({ ...now, targets: { ...now.targets, [name]: { ...now.targets[name], [end]: value } } })),
    addLine: () =>
      setTexts((now) =>
        now.makeUp.length >= MAX_MAKE_UP
          ? now
          : { ...now, makeUp: [...now.makeUp, { key: nextKey.current++, salt: '', amount: '', unit: 'g/L' }] },
      ),
    removeLine: (key: number) => {
      setTexts((now) => ({ ...now, makeUp: now.makeUp.filter((l) => l.key !== key) }));
      // Line errors are keyed by position, which has just shifted.
      setErrors((now) => ({ ...now, fields: Object.fromEntries(Object.entries(now.fields).filter(([p]) => !p.startsWith('makeUp.'))) }));
    },
    setLine,
  };
}

/** What useBathForm hands to the form's fields. */
export type BathFormState = ReturnType<typeof useBathForm>;
