// Make-up for people: the salts a shop adds, the amount to weigh or pour in the shop's units, the
// verdict, the before-and-after rows and the CSV. Pure functions over the JSON-safe MakeUpResult
// and the params as sent (a missing number is null).
import { formatNumber } from '@/components/screens/calculate/speciation-summary';
import { grouped } from '@/components/screens/calculators/dosing-plan/dosing-words';
import { gramsPerMole } from '@/components/screens/calculators/dosing-plan/reagent-stoich';
import { csvName, tableCsv } from '@/components/screens/calculators/frame/csv';
import { type TextFile } from '@/components/screens/calculators/frame/types';
import { type MakeUpResult } from '@/lib/calculators/make-up';
import { convertMass, convertVolume } from '@/lib/units';

/** Mass units offered for the amount to weigh out. */
export const MASS_CHOICES = ['g', 'kg', 'oz', 'lb'] as const;
export type MassChoice = (typeof MASS_CHOICES)[number];

/** A salt (or stock solution) a shop adds; `stock` for a liquid bought by mass fraction and density. */
export type SaltChoice = { key: string; label: string; formula: string; name: string; hint: string; stock?: { percent: number; densityKgPerL: number } };

/** The usual make-up salts; aqueous ammonia as bought (28 % NH3 by mass, 0.90 kg/L, common practice). */
export const SALTS: readonly SaltChoice[] = [
  { key: 'NaCN', label: 'NaCN', formula: 'NaCN', name: 'NaCN', hint: 'Sodium cyanide' },
  { key: 'KCN', label: 'KCN', formula: 'KCN', name: 'KCN', hint: 'Potassium cyanide' },
  { key: 'Na2S2O3·5H2O', label: 'Na2S2O3·5H2O', formula: 'Na2S2O3·5H2O', name: 'Na2S2O3·5H2O', hint: 'Sodium thiosulfate, the crystals' },
  { key: '(NH4)2S2O3', label: '(NH4)2S2O3', formula: '(NH4)2S2O3', name: '(NH4)2S2O3', hint: 'Ammonium thiosulfate' },
  { key: 'NH3', label: 'Aqueous ammonia', formula: 'NH3', name: 'aqueous ammonia', hint: 'Ammonia solution as bought, by mass fraction and density', stock: { percent: 28, densityKgPerL: 0.9 } },
];

/** Whether a stored output looks like a make-up result. */
export function isMakeUpResult(output: unknown): output is MakeUpResult {
  return typeof output === 'object' && output !== null && 'outcome' in output && 'addMol' in output && 'before' in output;
}

function num(x: unknown): number | null {
  return typeof x === 'number' && Number.isFinite(x) ? x : null;
}

type Sent = {
  volume?: { value?: unknown; unit?: unknown };
  salt?: { name?: unknown; formula?: unknown; stoich?: unknown; stock?: { massFraction?: unknown; densityKgPerL?: unknown } };
  target?: { kind?: unknown; component?: unknown; solid?: unknown; molPerL?: unknown };
  massUnit?: unknown;
};

/** The mass unit to show: the one chosen, kg when none was. */
export function massUnitOf(params: Record<string, unknown>): MassChoice {
  return MASS_CHOICES.find((u) => u === params.massUnit) ?? 'kg';
}

/** "1,200 L": the tank as given. */
export function tankText(params: Record<string, unknown>): string {
  const v = num((params as Sent).volume?.value);
  const unit = (params as Sent).volume?.unit === 'gal' ? 'gal' : 'L';
  return v === null ? 'the tank' : `${grouped(String(Number(v.toPrecision(6))))} ${unit}`;
}

function saltName(params: Record<string, unknown>): string {
  const name = (params as Sent).salt?.name;
  return typeof name === 'string' && name.trim() !== '' ? name : 'the salt';
}

/** What the target measures: "free CN-" or "headroom for AgCN(s)". */
export function targetWhat(params: Record<string, unknown>): string {
  const t = (params as Sent).target;
  if (t?.kind === 'headroom') return `headroom for ${String(t.solid ?? 'the solid')}`;
  return `free ${String(t?.component ?? 'ligand')}`;
}

/** The mass to weigh out in the unit chosen ("14.2 kg"), or null without a formula. */
export function massText(r: MakeUpResult, unit: MassChoice): string | null {
  const g = num(r.mass?.grams);
  if (g === null) return null;
  return `${grouped(formatNumber(convertMass(g, 'g', unit).toNumber()))} ${unit}`;
}

/** A stock solution to pour: litres, the volume in the tank's unit and its mass in grams. */
export type StockAmount = { volumeL: number; volume: number; massG: number; percent: number; densityKgPerL: number };

/**
 * The stock solution to pour for the moles found: the calculator's figure when it gives one, else
 * worked out here from the strength and density sent with the params (the shared params keep no
 * stock, so the engine weighs it as if dry: the stock's own few litres are not counted as dilution).
 */
export function stockAmount(r: MakeUpResult, params: Record<string, unknown>): StockAmount | null {
  const sent = (params as Sent).salt?.stock;
  const w = num(sent?.massFraction);
  const rho = num(sent?.densityKgPerL);
  const gal = (params as Sent).volume?.unit === 'gal';
  const toUnit = (l: number) => (gal ? convertVolume(l, 'L', 'gal').toNumber() : l);
  if (r.stock && num(r.stock.volumeL) !== null) {
    return { volumeL: r.stock.volumeL, volume: toUnit(r.stock.volumeL), massG: r.stock.massG, percent: (w ?? 0) * 100, densityKgPerL: rho ?? 0 };
  }
  const formula = (params as Sent).salt?.formula;
  const m = gramsPerMole(typeof formula === 'string' ? formula : null);
  const mol = num(r.addMol);
  if (w === null || rho === null || !(w > 0) || !(rho > 0) || m === null || mol === null) return null;
  const volumeL = (mol * m) / (w * rho * 1000);
  return { volumeL, volume: toUnit(volumeL), massG: volumeL * rho * 1000, percent: w * 100, densityKgPerL: rho };
}

/** The stock volume to pour in the tank's unit ("36.5 L"), or null for a dry salt. */
export function stockText(r: MakeUpResult, params: Record<string, unknown>): string | null {
  const s = stockAmount(r, params);
  return s ? `${grouped(formatNumber(s.volume))} ${(params as Sent).volume?.unit === 'gal' ? 'gal' : 'L'}` : null;
}

/** The mass of stock solution to weigh, in the unit chosen, or null. */
export function stockMassText(r: MakeUpResult, params: Record<string, unknown>): string | null {
  const s = stockAmount(r, params);
  const unit = massUnitOf(params);
  return s ? `${grouped(formatNumber(convertMass(s.massG, 'g', unit).toNumber()))} ${unit}` : null;
}

/** "Add 14.2 kg of NaCN to the 1,200 L tank: free CN- goes from 0.100 to 0.150 mol/L." (the calculator's own words otherwise). */
export function makeUpVerdict(r: MakeUpResult, params: Record<string, unknown>, fallback: string): string {
  if (r.outcome !== 'add') return fallback;
  const unit = massUnitOf(params);
  const mass = massText(r, unit);
  const stock = stockText(r, params);
  const amount = stock ? `${stock} of ${saltName(params)} (${stockMassText(r, params)})` : mass ? `${mass} of ${saltName(params)}` : null;
  if (!amount) return fallback;
  return `Add ${amount} to the ${tankText(params)} tank: ${targetWhat(params)} goes from ${formatNumber(num(r.before))} to ${formatNumber(num(r.achieved))} mol/L.`;
}

/** One row of the before-and-after table. */
export type MakeUpRow = { key: string; label: string; before: number | null; after: number | null };

/** g/L of the salt that gives `molPerL` of the counted component (count per mole of salt), or null. */
function asSaltGrams(molPerL: number | null, params: Record<string, unknown>): number | null {
  const s = (params as Sent).salt;
  const t = (params as Sent).target;
  const stoich = typeof s?.stoich === 'object' && s.stoich !== null ? (s.stoich as Record<string, number>) : {};
  const count = typeof t?.component === 'string' ? (stoich[t.component] ?? 0) : 0;
  const m = gramsPerMole(typeof s?.formula === 'string' ? s.formula : null);
  return molPerL === null || m === null || !(count > 0) ? null : (molPerL / count) * m;
}

/** The target quantity before and after, in mol/L (and g/L of the salt for a free target), and the target itself. */
export function makeUpRows(r: MakeUpResult, params: Record<string, unknown>): MakeUpRow[] {
  const what = targetWhat(params);
  const t = (params as Sent).target;
  const before = num(r.before);
  const after = num(r.achieved);
  const rows: MakeUpRow[] = [{ key: 'mol', label: `${what.charAt(0).toUpperCase()}${what.slice(1)} (mol/L)`, before, after }];
  if (t?.kind === 'free' && asSaltGrams(before, params) !== null) {
    rows.push({ key: 'g', label: `The same as ${String((params as Sent).salt?.formula)} (g/L)`, before: asSaltGrams(before, params), after: asSaltGrams(after, params) });
  }
  rows.push({ key: 'target', label: 'Target (mol/L)', before: null, after: num(t?.molPerL) });
  if (num(r.atMost) !== null) rows.push({ key: 'most', label: 'The most it reaches (mol/L)', before: null, after: num(r.atMost) });
  return rows;
}

/** The answer as CSV: amounts first, then the before-and-after rows. */
export function makeUpCsv(r: MakeUpResult, params: Record<string, unknown>): TextFile {
  const rows = makeUpRows(r, params).map((row) => [row.label, row.before, row.after]);
  const text = tableCsv(
    ['quantity', 'before', 'after'],
    [
      ['outcome', null, r.outcome],
      ['salt to add (mol)', null, num(r.addMol)],
      ['salt to add (g)', null, num(r.mass?.grams)],
      ['stock solution to add (L)', null, stockAmount(r, params)?.volumeL ?? null],
      ['tank volume after (L)', null, num(r.finalVolumeL)],
      ...rows,
    ],
  );
  return { filename: csvName('make-up', saltName(params)), text };
}
