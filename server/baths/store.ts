// Bath rows to API shapes, the checks a bath's fields need beyond their schema (process
// defaults, the salt a ligand is stated as, make-up salts, the owner), and where the latest
// analysis stands against the targets.
import { and, eq, inArray } from 'drizzle-orm';
import { z } from 'zod';

import { type AnalysisRow, type BathRow, baths, species, users } from '@/db/schema';
import { against, shown } from '@/lib/baths/quantities';
import { analyseFormula, convertVolume } from '@/lib/units';
import { HttpError } from '@/server/http-error';
import type { Tx } from '@/server/library/store';
import {
  type Analysis,
  type Bath,
  type bathInputSchema,
  type BathUnit,
  LIGAND_AS,
  type MakeUpLine,
  PROCESS_INFO,
  type Process,
  type Quantity,
  QUANTITIES,
  type Targets,
} from '@/shared/baths';

type BathFields = z.output<typeof bathInputSchema>;

function fieldError(path: string, message: string): HttpError {
  return new HttpError(400, 'validation_failed', `${path}: ${message}`, [{ path, message }]);
}

/** Names of people by id. */
export async function namesOf(tx: Tx, ids: readonly string[]): Promise<Map<string, string>> {
  const unique = [...new Set(ids)];
  if (unique.length === 0) return new Map();
  const rows = await tx.select({ id: users.id, name: users.name }).from(users).where(inArray(users.id, unique));
  return new Map(rows.map((r) => [r.id, r.name]));
}

/** Make-up salts as formulas: a formula is kept; a salt's name or alias from the catalogue becomes its formula. */
async function checkMakeUp(tx: Tx, lines: MakeUpLine[]): Promise<MakeUpLine[]> {
  const salts = await tx.select().from(species).where(eq(species.role, 'salt'));
  return lines.map((line, i) => {
    const wanted = line.salt.toLowerCase();
    const known = salts.find((s) => s.formula.toLowerCase() === wanted || s.name.toLowerCase() === wanted || s.aliases.some((a) => a.toLowerCase() === wanted));
    if (known) return { ...line, salt: known.formula };
    try {
      analyseFormula(line.salt);
      return line;
    } catch {
      throw fieldError(`makeUp.${i}.salt`, `"${line.salt}" is neither a formula (e.g. KCN, Na2S2O3·5H2O) nor a salt the library knows by name`);
    }
  });
}

/** The stored columns for a bath's fields; `userId` owns a new bath unless another owner is named. */
export async function bathColumns(tx: Tx, f: BathFields, userId: string): Promise<Omit<BathRow, 'id' | 'status' | 'createdBy' | 'createdAt' | 'updatedAt' | 'archivedAt' | 'archivedBy'>> {
  const info = PROCESS_INFO[f.process];
  const ligandAs = f.ligandAs ?? info.ligandAs;
  const allowed = LIGAND_AS[info.ligand] ?? [];
  if (!allowed.includes(ligandAs)) {
    throw fieldError('ligandAs', `state ${info.ligand} as one of ${allowed.join(', ')} for a ${info.label.toLowerCase()} bath`);
  }
  const ownerId = f.ownerId ?? userId;
  const [owner] = await tx.select({ id: users.id }).from(users).where(and(eq(users.id, ownerId), eq(users.active, true)));
  if (!owner) throw fieldError('ownerId', 'is not an active person on the team');
  return {
    name: f.name,
    process: f.process,
    volume: f.volume,
    volumeUnit: f.volumeUnit,
    volumeL: convertVolume(f.volume, f.volumeUnit, 'L').toNumber(),
    temperatureC: f.temperatureC,
    makeUp: await checkMakeUp(tx, f.makeUp),
    metal: info.metal,
    ligand: info.ligand,
    metalUnit: f.metalUnit ?? info.metalUnit,
    ligandUnit: f.ligandUnit ?? info.ligandUnit,
    ligandAs,
    carbonateAs: info.carbonateAs ?? null,
    targets: f.targets,
    site: f.site,
    ownerId,
    notes: f.notes,
  };
}

/** The API form of a bath row. */
export function toBath(row: BathRow, names: Map<string, string>): Bath {
  const process = row.process as Process;
  return {
    id: row.id,
    name: row.name,
    process,
    status: row.status as Bath['status'],
    volume: row.volume,
    volumeUnit: row.volumeUnit as Bath['volumeUnit'],
    volumeL: row.volumeL,
    temperatureC: row.temperatureC,
    makeUp: row.makeUp as MakeUpLine[],
    metal: row.metal,
    ligand: row.ligand,
    metalUnit: row.metalUnit as BathUnit,
    ligandUnit: row.ligandUnit as BathUnit,
    ligandAs: row.ligandAs,
    carbonateAs: row.carbonateAs,
    extras: [...PROCESS_INFO[process].extras],
    targets: row.targets as Targets,
    site: row.site,
    owner: { id: row.ownerId, name: names.get(row.ownerId) ?? 'Unknown' },
    notes: row.notes,
    createdBy: { id: row.createdBy, name: names.get(row.createdBy) ?? 'Unknown' },
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    archivedAt: row.archivedAt?.toISOString() ?? null,
  };
}

/** Stored values of an analysis row, by quantity (mol/L; pH as pH). */
export function valuesOf(row: AnalysisRow): Analysis['values'] {
  return {
    metal: row.metalMolL,
    freeLigand: row.freeLigandMolL,
    totalLigand: row.totalLigandMolL,
    pH: row.ph,
    carbonate: row.carbonateMolL,
    bromide: row.bromideMolL,
  };
}

const TARGETED: readonly Quantity[] = ['metal', 'freeLigand', 'pH'];

/** Values outside the bath's target ranges, in the bath's units. */
export function outOfRange(bath: Bath, values: Analysis['values']): Analysis['outOfRange'] {
  const out: Analysis['outOfRange'] = [];
  for (const q of QUANTITIES) {
    const stored = values[q];
    if (stored === null || !TARGETED.includes(q)) continue;
    const value = shown(bath, q, stored);
    const side = against(bath.targets[q as 'metal' | 'freeLigand' | 'pH'], value);
    if (side !== 'inside') out.push({ quantity: q, value, side });
  }
  return out;
}

/** The API form of an analysis row. */
export function toAnalysis(row: AnalysisRow, bath: Bath, names: Map<string, string>): Analysis {
  const values = valuesOf(row);
  return {
    id: row.id,
    bathId: row.bathId,
    sampledAt: row.sampledAt.toISOString(),
    analyst: row.analyst,
    values,
    entered: row.entered as Analysis['entered'],
    notes: row.notes,
    source: row.source as Analysis['source'],
    enteredBy: { id: row.enteredBy, name: names.get(row.enteredBy) ?? 'Unknown' },
    createdAt: row.createdAt.toISOString(),
    outOfRange: outOfRange(bath, values),
  };
}

const idParam = z.string().uuid();

/** The bath named by :id (404 when there is none), its row locked when `lock`. */
export async function findBath(tx: Tx, raw: unknown, lock = false): Promise<BathRow> {
  const parsed = idParam.safeParse(raw);
  if (!parsed.success) throw new HttpError(404, 'not_found', `No bath with id ${String(raw)}.`);
  const query = tx.select().from(baths).where(eq(baths.id, parsed.data));
  const [row] = lock ? await query.for('update') : await query;
  if (!row) throw new HttpError(404, 'not_found', `No bath with id ${parsed.data}.`);
  return row;
}

/** The API form of a bath, with the names it shows. */
export async function bathOf(tx: Tx, row: BathRow): Promise<Bath> {
  return toBath(row, await namesOf(tx, [row.ownerId, row.createdBy]));
}
