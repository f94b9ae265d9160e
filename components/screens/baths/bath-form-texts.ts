// The bath form as typed (numbers stay text until sent) and its reading into a BathInput for the schema.
import { NOT_A_NUMBER, numberText, readNumber, type EmptyMeans } from '@/components/screens/library/number-text';
import {
  LIGAND_AS,
  MAKE_UP_UNITS,
  PROCESS_INFO,
  type Bath,
  type BathUnit,
  type Process,
  type VOLUME_UNITS,
} from '@/shared/baths';

/** One make-up line as typed; `key` keeps React rows stable while lines are added and removed. */
export type MakeUpText = { key: number; salt: string; amount: string; unit: (typeof MAKE_UP_UNITS)[number] };

/** The ranges the form holds, as the schema names them. */
export const TARGETS = ['metal', 'freeLigand', 'pH'] as const;
export type TargetName = (typeof TARGETS)[number];

/** Everything the bath form holds, as typed. */
export type BathTexts = {
  name: string;
  process: Process | null;
  volume: string;
  volumeUnit: (typeof VOLUME_UNITS)[number];
  temperatureC: string;
  makeUp: MakeUpText[];
  metalUnit: BathUnit;
  ligandUnit: BathUnit;
  ligandAs: string;
  targets: Record<TargetName, { min: string; max: string }>;
  site: string;
  notes: string;
};

/** Most make-up lines a bath takes (the schema's limit). */
export const MAX_MAKE_UP = 20;

/** Field paths the form shows errors beside, as the schema and the server's validation details name them. */
export const FIELD_PATHS = [
  'name',
  'process',
  'volume',
  'volumeUnit',
  'temperatureC',
  'makeUp',
  'metalUnit',
  'ligandUnit',
  'ligandAs',
  'targets.metal.min',
  'targets.metal.max',
  'targets.freeLigand.min',
  'targets.freeLigand.max',
  'targets.pH.min',
  'targets.pH.max',
  'site',
  'notes',
] as const;

/** Every path with an error place: the fixed fields and each make-up line's salt, amount and unit. */
export const KNOWN_PATHS: readonly string[] = [
  ...FIELD_PATHS,
  ...Array.from({ length: MAX_MAKE_UP }, (_, i) => [`makeUp.${i}.salt`, `makeUp.${i}.amount`, `makeUp.${i}.unit`]).flat(),
];

/** Words for each field in the summary of a form with mistakes. */
export function fieldName(path: string): string {
  const line = /^makeUp\.(\d+)\./.exec(path);
  if (line) return `make-up line ${Number(line[1]) + 1}`;
  const names: Record<string, string> = {
    name: 'name',
    process: 'process',
    volume: 'tank volume',
    volumeUnit: 'volume unit',
    temperatureC: 'temperature',
    makeUp: 'make-up',
    metalUnit: 'metal unit',
    ligandUnit: 'ligand unit',
    ligandAs: 'ligand stated as',
    'targets.metal.min': 'metal range',
    'targets.metal.max': 'metal range',
    'targets.freeLigand.min': 'free ligand range',
    'targets.freeLigand.max': 'free ligand range',
    'targets.pH.min': 'pH range',
    'targets.pH.max': 'pH range',
    site: 'site',
    notes: 'notes',
  };
  return names[path] ?? path;
}

const EMPTY_TARGETS: BathTexts['targets'] = {
  metal: { min: '', max: '' },
  freeLigand: { min: '', max: '' },
  pH: { min: '', max: '' },
};

/** A blank bath in litres with the common units until a process is chosen. */
export const BLANK_BATH: BathTexts = {
  name: '',
  process: null,
  volume: '',
  volumeUnit: 'L',
  temperatureC: '',
  makeUp: [],
  metalUnit: 'g/L',
  ligandUnit: 'g/L',
  ligandAs: '',
  targets: EMPTY_TARGETS,
  site: '',
  notes: '',
};

/** The salts the process's ligand may be stated as (none before a process is chosen). */
export function ligandChoices(process: Process | null): readonly string[] {
  return process ? (LIGAND_AS[PROCESS_INFO[process].ligand] ?? []) : [];
}

/** The form filled from a saved bath, for editing. */
export function textsFrom(b: Bath): BathTexts {
  const range = (r: { min: number | null; max: number | null }) => ({ min: numberText(r.min), max: numberText(r.max) });
  return {
    name: b.name,
    process: b.process,
    volume: numberText(b.volume),
    volumeUnit: b.volumeUnit,
    temperatureC: numberText(b.temperatureC),
    makeUp: b.makeUp.map((l, i) => ({ key: i, salt: l.salt, amount: numberText(l.amount), unit: l.unit })),
    metalUnit: b.metalUnit,
    ligandUnit: b.ligandUnit,
    ligandAs: b.ligandAs,
    targets: { metal: range(b.targets.metal), freeLigand: range(b.targets.freeLigand), pH: range(b.targets.pH) },
    site: b.site,
    notes: b.notes,
  };
}

/** The typed form as values for bathInputSchema, and the fields whose text is not a number. */
export function readBathForm(texts: BathTexts): { values: Record<string, unknown>; bad: Record<string, string> } {
  const bad: Record<string, string> = {};
  const num = (path: string, text: string, empty: EmptyMeans) => {
    const read = readNumber(text, empty);
    if (read.bad) bad[path] = NOT_A_NUMBER;
    return read.value;
  };
  const targets = Object.fromEntries(
    TARGETS.map((t) => [
      t,
      { min: num(`targets.${t}.min`, texts.targets[t].min, 'null'), max: num(`targets.${t}.max`, texts.targets[t].max, 'null') },
    ]),
  );
  const values = {
    name: texts.name,
    process: texts.process ?? undefined,
    volume: num('volume', texts.volume, 'required'),
    volumeUnit: texts.volumeUnit,
    temperatureC: num('temperatureC', texts.temperatureC, 'null'),
    makeUp: texts.makeUp.map((l, i) => ({ salt: l.salt, amount: num(`makeUp.${i}.amount`, l.amount, 'required'), unit: l.unit })),
    metalUnit: texts.metalUnit,
    ligandUnit: texts.ligandUnit,
    ligandAs: texts.ligandAs.trim() === '' ? undefined : texts.ligandAs,
    targets,
    site: texts.site,
    notes: texts.notes,
  };
  return { values, bad };
}
