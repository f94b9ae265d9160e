// Reading and writing the constants library: species added from their formulas, reactions checked
// and stored as terms, versions listed with the people behind them. The library is small (hundreds
// of rows), so lists are read whole and filtered here rather than in SQL.
import { randomUUID } from 'node:crypto';

import { eq, inArray } from 'drizzle-orm';

import type { Db } from '@/db/client';
import { constants, constantTerms, type ConstantRow, species, type SpeciesRow, users } from '@/db/schema';
import { buildSelection, type CatalogueEntry, type LibraryConstant, type SelectionBuild, type SelectionChoice, selectionKey } from '@/lib/library/build';
import { type CheckedReaction, fromSignedTerms, isSolidFormula, ReactionError } from '@/lib/library/reaction';
import { analyseFormula, molarMass } from '@/lib/units';
import { readRevisions, type Revisions } from '@/server/revisions';
import {
  BASIS_ROLES,
  type ConstantKind,
  type ConstantQuery,
  type ConstantStatus,
  type ConstantSummary,
  type Species,
  type SpeciesRole,
  type Term,
} from '@/shared/constants';

/** Key for pg_advisory_xact_lock around new proposals and imports, so two never add the same reaction. */
export const PROPOSAL_LOCK_KEY = 4_711_002;

/** A database or a transaction. */
export type Tx = Pick<Db, 'select' | 'insert' | 'update' | 'execute'>;

/** The role a new species takes when a proposal names it: solids by "(s)", anything else a dissolved species. */
function newSpeciesRole(formula: string): SpeciesRole {
  return isSolidFormula(formula) ? 'solid' : 'complex';
}

/** The catalogue rows for the formulas, adding dissolved species and solids that are new; building blocks must exist already. */
export async function ensureSpecies(tx: Tx, formulas: readonly string[], defines: string): Promise<Map<string, SpeciesRow>> {
  const rows = formulas.length ? await tx.select().from(species).where(inArray(species.formula, [...formulas])) : [];
  const byFormula = new Map(rows.map((r) => [r.formula, r]));
  for (const formula of formulas) {
    if (byFormula.has(formula)) continue;
    if (formula !== defines) {
      throw new ReactionError(
        'reaction',
        `"${formula}" is not in the species catalogue: add the constant that defines it first, or check how it is written (charges after the formula, e.g. "Cu+2")`,
      );
    }
    const parsed = analyseFormula(formula);
    const [row] = await tx
      .insert(species)
      .values({ formula, name: formula, charge: parsed.charge, molarMass: molarMass(formula).toFixed(5), role: newSpeciesRole(formula) })
      .onConflictDoNothing()
      .returning();
    const stored = row ?? (await tx.select().from(species).where(eq(species.formula, formula)))[0];
    if (!stored) throw new Error(`species ${formula} could not be stored`);
    byFormula.set(formula, stored);
  }
  const definedRow = byFormula.get(defines);
  if (definedRow && BASIS_ROLES.includes(definedRow.role as SpeciesRole)) {
    throw new ReactionError('reaction', `${defines} is a building block (${definedRow.role.replace('_', '-')}); a constant cannot define it`);
  }
  return byFormula;
}

/** The values stored on a version. */
export interface VersionValues {
  logValue: number;
  uncertainty: number | null;
  temperatureC: number;
  ionicStrength: number;
  medium: string;
  enthalpyKjMol: number | null;
  source: string;
  note: string;
}

/** Inserts one version with its terms. */
export async function insertVersion(
  tx: Tx,
  v: VersionValues & {
    kind: ConstantKind;
    checked: CheckedReaction;
    status: ConstantStatus;
    lineageId?: string;
    version?: number;
    replacesId?: number | null;
    proposedBy: string | null;
    reviewNote?: string | null;
    reviewedAt?: Date | null;
  },
): Promise<ConstantRow> {
  const speciesRows = await ensureSpecies(
    tx,
    v.checked.terms.map((t) => t.species),
    v.checked.defines,
  );
  const [row] = await tx
    .insert(constants)
    .values({
      lineageId: v.lineageId ?? randomUUID(),
      version: v.version ?? 1,
      replacesId: v.replacesId ?? null,
      kind: v.kind,
      reaction: v.checked.reaction,
      reactionKey: v.checked.key,
      definesSpeciesId: (speciesRows.get(v.checked.defines) as SpeciesRow).id,
      logValue: v.logValue,
      uncertainty: v.uncertainty,
      temperatureC: v.temperatureC,
      ionicStrength: v.ionicStrength,
      medium: v.medium,
      enthalpyKjMol: v.enthalpyKjMol,
      source: v.source,
      note: v.note,
      status: v.status,
      proposedBy: v.proposedBy,
      reviewNote: v.reviewNote ?? null,
      reviewedAt: v.reviewedAt ?? null,
    })
    .returning();
  if (!row) throw new Error('constant not stored');
  await tx.insert(constantTerms).values(
    v.checked.terms.map((t, position) => ({
      constantId: row.id,
      speciesId: (speciesRows.get(t.species) as SpeciesRow).id,
      coefficient: t.coefficient,
      position,
    })),
  );
  return row;
}

/** Everything read at once: rows, terms, species and people's names. */
export interface LibrarySnapshot {
  rows: ConstantRow[];
  terms: Map<number, Term[]>;
  speciesById: Map<number, SpeciesRow>;
  speciesByFormula: Map<string, SpeciesRow>;
  names: Map<string, string>;
}

/** Reads the whole library (every version) with terms, catalogue and names. */
export async function readLibrary(db: Tx): Promise<LibrarySnapshot> {
  const [rows, termRows, speciesRows, people] = await Promise.all([
    db.select().from(constants),
    db.select().from(constantTerms),
    db.select().from(species),
    db.select({ id: users.id, name: users.name }).from(users),
  ]);
  const speciesById = new Map(speciesRows.map((s) => [s.id, s]));
  const terms = new Map<number, (Term & { position: number })[]>();
  for (const t of termRows) {
    const list = terms.get(t.constantId) ?? [];
    list.push({ species: (speciesById.get(t.speciesId) as SpeciesRow).formula, coefficient: t.coefficient, position: t.position });
    terms.set(t.constantId, list);
  }
  const ordered = new Map<number, Term[]>();
  for (const [id, list] of terms) ordered.set(id, list.sort((a, b) => a.position - b.position).map(({ species: s, coefficient }) => ({ species: s, coefficient })));
  return {
    rows,
    terms: ordered,
    speciesById,
    speciesByFormula: new Map(speciesRows.map((s) => [s.formula, s])),
    names: new Map(people.map((p) => [p.id, p.name])),
  };
}

/** Catalogue entries for the builder. */
export function catalogueOf(snap: LibrarySnapshot): CatalogueEntry[] {
  return [...snap.speciesById.values()].map((s) => ({ formula: s.formula, role: s.role as SpeciesRole }));
}

/** Versions for the builder (every status; the builder picks). */
export function libraryConstants(snap: LibrarySnapshot): LibraryConstant[] {
  return snap.rows.map((r) => ({
    id: r.id,
    lineageId: r.lineageId,
    version: r.version,
    status: r.status as ConstantStatus,
    kind: r.kind as ConstantKind,
    reaction: r.reaction,
    terms: snap.terms.get(r.id) ?? [],
    defines: (snap.speciesById.get(r.definesSpeciesId) as SpeciesRow).formula,
    logValue: r.logValue,
    temperatureC: r.temperatureC,
    ionicStrength: r.ionicStrength,
    enthalpyKjMol: r.enthalpyKjMol,
    source: r.source,
  }));
}

/**
 * What the system builder reads: the catalogue and every version, with the library-dependent part
 * of each selection built so far on them (selectionFor).
 */
export type BuildInputs = { catalogue: CatalogueEntry[]; constants: LibraryConstant[]; selections: Map<string, SelectionBuild> };

/** Selections kept per library revision; a bath shop uses a handful, so the limit is rarely met. */
const SELECTION_LIMIT = 64;

/** Freezes a kept build part all the way down, so a caller that changed it would fail loudly instead of altering others' builds. */
function freezeDeep<T>(value: T): T {
  if (typeof value === 'object' && value !== null && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const v of Object.values(value)) freezeDeep(v);
  }
  return value;
}

/**
 * The library-dependent part of a build for this choice of ions (lib/library/build.ts), built once
 * per library revision and choice, whatever the totals and pH. Throws BuildError as buildSystem does.
 */
export function selectionFor(inputs: BuildInputs, sel: SelectionChoice): SelectionBuild {
  const key = selectionKey(sel);
  const held = inputs.selections.get(key);
  if (held) return held;
  const part = freezeDeep(buildSelection(inputs.catalogue, inputs.constants, sel));
  if (inputs.selections.size >= SELECTION_LIMIT) inputs.selections.clear();
  inputs.selections.set(key, part);
  return part;
}

// The builder's view of the library, kept between requests: every calculation needs it, and
// reading and mapping the whole library took most of a calculation's time. library_revision counts
// up inside every transaction that changes species, constants or terms (migration 0012), so the
// view is reused while the revision stands. The key also names the database, so two databases in
// one process never share an entry.
const buildCache = new Map<string, BuildInputs>();
const BUILD_CACHE_LIMIT = 8;

/** The catalogue and versions for the builder, from memory when the library has not changed since. */
export async function libraryForBuild(tx: Tx, known?: Revisions): Promise<BuildInputs> {
  const revisions = known ?? (await readRevisions(tx));
  // The revision is read before the rows: rows changed in between are kept under the old number,
  // which no later request asks for.
  const key = revisions.library === null ? null : `${revisions.database}|${revisions.library}`;
  const held = key === null ? undefined : buildCache.get(key);
  if (held) return held;
  const snap = await readLibrary(tx);
  const inputs = { catalogue: catalogueOf(snap), constants: libraryConstants(snap), selections: new Map<string, SelectionBuild>() };
  if (key === null) return inputs;
  if (buildCache.size >= BUILD_CACHE_LIMIT) buildCache.delete(buildCache.keys().next().value as string);
  buildCache.set(key, inputs);
  return inputs;
}

/** Every species a constant's reaction touches, following the constants that define its other species. */
function touchedSpecies(snap: LibrarySnapshot): (row: ConstantRow) => Set<string> {
  const definer = new Map<number, ConstantRow>();
  for (const r of snap.rows) {
    const held = definer.get(r.definesSpeciesId);
    const better = !held || (r.status === 'approved' && held.status !== 'approved') || (r.status === held.status && r.id > held.id);
    if (better) definer.set(r.definesSpeciesId, r);
  }
  const memo = new Map<number, Set<string>>();
  const visit = (row: ConstantRow, seen: Set<number>): Set<string> => {
    const cached = memo.get(row.id);
    if (cached) return cached;
    const out = new Set<string>();
    for (const t of snap.terms.get(row.id) ?? []) {
      out.add(t.species);
      const s = snap.speciesByFormula.get(t.species);
      const d = s && s.id !== row.definesSpeciesId ? definer.get(s.id) : undefined;
      if (d && !seen.has(d.id)) for (const x of visit(d, new Set([...seen, d.id]))) out.add(x);
    }
    memo.set(row.id, out);
    return out;
  };
  return (row) => visit(row, new Set([row.id]));
}

function person(names: Map<string, string>, id: string | null): { id: string; name: string } | null {
  return id ? { id, name: names.get(id) ?? 'Unknown' } : null;
}

/** The API form of every version in the snapshot. */
export function summaries(snap: LibrarySnapshot): ConstantSummary[] {
  const touched = touchedSpecies(snap);
  return snap.rows.map((r) => {
    const terms = snap.terms.get(r.id) ?? [];
    const { reactants, products } = fromSignedTerms(terms);
    const all = touched(r);
    const role = (f: string) => snap.speciesByFormula.get(f)?.role;
    const metals = [...all].filter((f) => role(f) === 'metal').sort();
    const ligands = [...all].filter((f) => role(f) === 'ligand' || f === 'OH-').sort();
    return {
      id: r.id,
      lineageId: r.lineageId,
      version: r.version,
      replacesId: r.replacesId,
      kind: r.kind as ConstantKind,
      reaction: r.reaction,
      reactants,
      products,
      defines: (snap.speciesById.get(r.definesSpeciesId) as SpeciesRow).formula,
      metals,
      ligands,
      logValue: r.logValue,
      uncertainty: r.uncertainty,
      temperatureC: r.temperatureC,
      ionicStrength: r.ionicStrength,
      medium: r.medium,
      enthalpyKjMol: r.enthalpyKjMol,
      source: r.source,
      note: r.note,
      status: r.status as ConstantStatus,
      proposedBy: person(snap.names, r.proposedBy),
      proposedAt: r.proposedAt.toISOString(),
      reviewedBy: person(snap.names, r.reviewedBy),
      reviewedAt: r.reviewedAt?.toISOString() ?? null,
      reviewNote: r.reviewNote,
      retiredBy: person(snap.names, r.retiredBy),
      retiredAt: r.retiredAt?.toISOString() ?? null,
      retireNote: r.retireNote,
    };
  });
}

/** Words to search in for a version: reaction, source, medium, note, and the names and aliases of its species. */
function searchText(c: ConstantSummary, snap: LibrarySnapshot): string {
  const names = [...c.reactants, ...c.products].flatMap((t) => {
    const s = snap.speciesByFormula.get(t.species);
    return s ? [s.name, ...s.aliases] : [];
  });
  return [c.reaction, c.source, c.medium, c.note, c.defines, ...names].join(' ').toLowerCase();
}

const STATUS_ORDER: Record<ConstantStatus, number> = { draft: 0, approved: 1, rejected: 2, retired: 3 };

/** Filters and sorts summaries as the list and the CSV export do. */
export function filterSummaries(all: ConstantSummary[], query: Required<Pick<ConstantQuery, 'status' | 'sort' | 'dir'>> & ConstantQuery, snap: LibrarySnapshot): ConstantSummary[] {
  const q = query.q?.toLowerCase();
  const out = all.filter((c) => {
    if (query.status === 'current' ? c.status !== 'approved' && c.status !== 'draft' : query.status !== 'all' && c.status !== query.status) return false;
    if (query.kind && c.kind !== query.kind) return false;
    if (query.metal && !c.metals.includes(query.metal)) return false;
    if (query.ligand && !c.ligands.includes(query.ligand)) return false;
    if (q && !searchText(c, snap).includes(q)) return false;
    return true;
  });
  const sign = query.dir === 'desc' ? -1 : 1;
  const key = (c: ConstantSummary): string | number => {
    switch (query.sort) {
      case 'kind':
        return c.kind;
      case 'logValue':
        return c.logValue;
      case 'status':
        return STATUS_ORDER[c.status];
      case 'proposedAt':
        return c.proposedAt;
      case 'defines':
        return c.defines.toLowerCase();
      default:
        // By the first species, not by a leading coefficient ("2 Cu+2 + ..." sorts under Cu).
        return c.reaction.replace(/^\d+(?:\.\d+)?\s+/, '').toLowerCase();
    }
  };
  return out.sort((a, b) => {
    const ka = key(a);
    const kb = key(b);
    const cmp = ka < kb ? -1 : ka > kb ? 1 : a.id - b.id;
    return sign * cmp;
  });
}

/** The API form of a catalogue row. */
export function toSpecies(s: SpeciesRow): Species {
  return { id: s.id, formula: s.formula, name: s.name, charge: s.charge, molarMass: s.molarMass, role: s.role as SpeciesRole, aliases: s.aliases };
}
