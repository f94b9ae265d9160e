// One analysis as entered (values in any bath unit) to the stored row (mol/L), shared by manual
// entry and CSV upload. Problems come back as {path, message} so each caller can report them its
// own way (a 400 for a form, a row and column for a file).
import type { z } from 'zod';

import type { AnalysisRow } from '@/db/schema';
import { toStored } from '@/lib/baths/quantities';
import type { analysisInputSchema, Bath, BathUnit, Quantity } from '@/shared/baths';

type AnalysisFields = z.output<typeof analysisInputSchema>;
type Columns = Pick<AnalysisRow, 'sampledAt' | 'analyst' | 'metalMolL' | 'freeLigandMolL' | 'totalLigandMolL' | 'ph' | 'carbonateMolL' | 'bromideMolL' | 'entered' | 'notes'>;

/** A sampling time: a date alone is taken as noon UTC, so it shows as that day in every time zone near it. */
export function sampledAtOf(text: string): Date {
  return /^\d{4}-\d{2}-\d{2}$/.test(text) ? new Date(`${text}T12:00:00Z`) : new Date(text);
}

const COLUMN: Record<Exclude<Quantity, 'pH'>, keyof Columns> = {
  metal: 'metalMolL',
  freeLigand: 'freeLigandMolL',
  totalLigand: 'totalLigandMolL',
  carbonate: 'carbonateMolL',
  bromide: 'bromideMolL',
};

const DEFAULT_UNIT: Record<Exclude<Quantity, 'pH'>, 'metalUnit' | 'ligandUnit'> = {
  metal: 'metalUnit',
  freeLigand: 'ligandUnit',
  totalLigand: 'ligandUnit',
  carbonate: 'ligandUnit',
  bromide: 'ligandUnit',
};

/** The row's columns, or the problems (path, message) that stop it. */
export function analysisColumns(bath: Bath, a: AnalysisFields, now = new Date()): { columns: Columns } | { problems: { path: string; message: string }[] } {
  const problems: { path: string; message: string }[] = [];
  const sampledAt = sampledAtOf(a.sampledAt);
  if (Number.isNaN(sampledAt.getTime())) problems.push({ path: 'sampledAt', message: 'is not a date' });
  else if (sampledAt.getTime() > now.getTime() + 24 * 3600 * 1000) problems.push({ path: 'sampledAt', message: 'is in the future' });
  const columns: Columns = {
    sampledAt,
    analyst: a.analyst,
    metalMolL: null,
    freeLigandMolL: null,
    totalLigandMolL: null,
    ph: a.pH ?? null,
    carbonateMolL: null,
    bromideMolL: null,
    entered: {},
    notes: a.notes,
  };
  const entered: Record<string, { value: number; unit: string | null }> = {};
  if (a.pH !== undefined) entered.pH = { value: a.pH, unit: null };
  for (const q of Object.keys(COLUMN) as Exclude<Quantity, 'pH'>[]) {
    const v = a[q];
    if (v === undefined) continue;
    if ((q === 'carbonate' || q === 'bromide') && !bath.extras.includes(q)) {
      problems.push({ path: q, message: `a ${bath.process.replace(/_/g, ' ')} bath does not log ${q}` });
      continue;
    }
    const unit: BathUnit = v.unit ?? bath[DEFAULT_UNIT[q]];
    (columns[COLUMN[q]] as number | null) = toStored(bath, q, v.value, unit);
    entered[q] = { value: v.value, unit };
  }
  columns.entered = entered;
  if (columns.freeLigandMolL !== null && columns.totalLigandMolL !== null && columns.freeLigandMolL > columns.totalLigandMolL * (1 + 1e-9)) {
    problems.push({ path: 'freeLigand', message: 'is more than the total ligand; check the two titrations' });
  }
  return problems.length > 0 ? { problems } : { columns };
}
