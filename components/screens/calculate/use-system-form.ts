import { useState } from 'react';

import { COUNTER_CHOICES, LIGAND_CHOICES, METAL_CHOICES } from '@/components/screens/calculate/speciation-summary';
import { checkForm, NO_ERRORS, type FormErrors } from '@/lib/api/form-errors';
import { convertConcentration } from '@/lib/units';
import { systemRequestSchema, type SystemRequest } from '@/shared/constants';

/** Which list a component belongs to in the request. */
export type ComponentGroup = 'metals' | 'ligands' | 'counterIons';

/** The activity models a person can choose. */
export type ActivityChoice = 'davies' | 'ideal';

const ORDER: Record<ComponentGroup, readonly string[]> = {
  metals: METAL_CHOICES.map((c) => c.formula),
  ligands: LIGAND_CHOICES.map((c) => c.formula),
  counterIons: COUNTER_CHOICES.map((c) => c.formula),
};

/** Field names that errors can sit beside (the totals add "totals.<formula>" for each chosen component). */
const FIXED_FIELDS = ['metals', 'ligands', 'counterIons', 'solids', 'pH', 'activity', 'includeDrafts', 'temperatureC', 'totals'];

/** A number typed by a person: "0.05", "5e-2" or "0,05"; undefined when empty, NaN when unreadable. */
export function parseAmount(text: string): number | undefined {
  const t = text.trim();
  if (t === '') return undefined;
  const normal = /^[^.]*,[^,]*$/.test(t) ? t.replace(',', '.') : t;
  return /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(normal) ? Number(normal) : Number.NaN;
}

/** The state of the system builder's inputs and the request they make. */
export function useSystemForm() {
  const [groups, setGroups] = useState<Record<ComponentGroup, string[]>>({ metals: [], ligands: [], counterIons: [] });
  const [totals, setTotals] = useState<Record<string, string>>({});
  // The unit each total is typed in (mol/L unless changed); sent as mol/L.
  const [totalUnits, setTotalUnits] = useState<Record<string, TotalUnit>>({});
  const [pH, setPH] = useState('');
  const [temperature, setTemperature] = useState('25');
  const [activity, setActivity] = useState<ActivityChoice>('davies');
  const [includeDrafts, setIncludeDrafts] = useState(false);
  // null: every solid the ions can form (nothing sent); a list once the person changes it.
  const [solids, setSolids] = useState<string[] | null>(null);
  const [errors, setErrors] = useState<FormErrors>(NO_ERRORS);
  // Bumped on every change so a result can tell that the inputs moved on since it was worked out.
  const [version, setVersion] = useState(0);

  const touched = () => setVersion((v) => v + 1);
  const chosen = [...groups.metals, ...groups.ligands, ...groups.counterIons];

  const toggle = (group: ComponentGroup, formula: string) => {
    setGroups((now) => {
      const on = now[group].includes(formula);
      return { ...now, [group]: ORDER[group].filter((f) => (f === formula ? !on : now[group].includes(f))) };
    });
    // A different set of ions can form different solids: go back to "all of them".
    setSolids(null);
    touched();
  };

  /** Checks the inputs; the request to send, or the errors to show beside the fields. */
  const toRequest = (): { ok: true; request: SystemRequest } | { ok: false; errors: FormErrors } => {
    const fields: Record<string, string> = {};
    const amounts: Record<string, number> = {};
    for (const formula of chosen) {
      const value = parseAmount(totals[formula] ?? '');
      const unit = totalUnits[formula] ?? 'mol/L';
      if (value === undefined) fields[`totals.${formula}`] = `Enter the total in ${unit}`;
      else if (Number.isNaN(value)) fields[`totals.${formula}`] = `Must be a number of ${unit}`;
      else if (value < 0) fields[`totals.${formula}`] = 'Cannot be negative';
      else amounts[formula] = toMolPerLitre(value, unit, formula);
    }
    const pHValue = parseAmount(pH);
    if (pHValue !== undefined && Number.isNaN(pHValue)) fields.pH = 'Must be a number (or leave it empty)';
    const temperatureValue = parseAmount(temperature);
    if (temperatureValue !== undefined && Number.isNaN(temperatureValue)) fields.temperatureC = 'Must be a number of °C (or leave it empty for 25 °C)';
    const request: SystemRequest = {
      metals: groups.metals,
      ligands: groups.ligands,
      counterIons: groups.counterIons,
      totals: amounts,
      activity,
      includeDrafts,
      ...(pHValue !== undefined && !Number.isNaN(pHValue) ? { pH: pHValue } : {}),
      ...(temperatureValue !== undefined && !Number.isNaN(temperatureValue) ? { temperatureC: temperatureValue } : {}),
      ...(solids ? { solids } : {}),
    };
    const check = checkForm(systemRequestSchema, request, knownFields(chosen));
    const merged: FormErrors = check.ok ? { fields } : { ...check.errors, fields: { ...check.errors.fields, ...fields } };
    if (Object.keys(merged.fields).length > 0 || merged.form) return { ok: false, errors: merged };
    return { ok: true, request };
  };

  /** Replaces every input with a system request (a bath's prefill); the solids choice goes back to "all" unless it names some. */
  const load = (request: SystemRequest) => {
    setGroups({
      metals: ordered('metals', request.metals),
      ligands: ordered('ligands', request.ligands ?? []),
      counterIons: ordered('counterIons', request.counterIons ?? []),
    });
    setTotals(Object.fromEntries(Object.entries(request.totals ?? {}).map(([k, v]) => [k, amountText(v)])));
    setTotalUnits({});
    setPH(request.pH === undefined ? '' : amountText(request.pH));
    setTemperature(request.temperatureC === undefined ? '25' : amountText(request.temperatureC));
    setActivity(request.activity ?? 'davies');
    setIncludeDrafts(request.includeDrafts ?? false);
    setSolids(request.solids ? [...request.solids] : null);
    setErrors(NO_ERRORS);
    touched();
  };

  return {
    groups,
    chosen,
    totals,
    totalUnits,
    pH,
    temperature,
    activity,
    includeDrafts,
    solids,
    errors,
    version,
    setErrors,
    toggle,
    load,
    toRequest,
    knownFields: () => knownFields(chosen),
    /** Changes the unit a total is typed in, converting what is typed so the amount stays the same. */
    setTotalUnit: (formula: string, unit: TotalUnit) => {
      const from = totalUnits[formula] ?? 'mol/L';
      const value = parseAmount(totals[formula] ?? '');
      if (value !== undefined && !Number.isNaN(value) && value >= 0 && from !== unit) {
        const converted = convertConcentration(value, from, unit, { formula }).toNumber();
        setTotals((now) => ({ ...now, [formula]: amountText(Number(converted.toPrecision(6))) }));
      }
      setTotalUnits((now) => ({ ...now, [formula]: unit }));
      touched();
    },
    setTotal: (formula: string, text: string) => {
      setTotals((now) => ({ ...now, [formula]: text }));
      touched();
    },
    setPH: (text: string) => {
      setPH(text);
      touched();
    },
    setTemperature: (text: string) => {
      setTemperature(text);
      touched();
    },
    setActivity: (value: ActivityChoice) => {
      setActivity(value);
      touched();
    },
    setIncludeDrafts: (value: boolean) => {
      setIncludeDrafts(value);
      touched();
    },
    /** Turns one solid on or off, starting from `available` (every solid on) the first time. */
    toggleSolid: (name: string, available: readonly string[]) => {
      setSolids((now) => {
        const current = now ?? [...available];
        return current.includes(name) ? current.filter((s) => s !== name) : available.filter((s) => s === name || current.includes(s));
      });
      touched();
    },
  };
}

/** The system builder's form state and actions. */
export type SystemForm = ReturnType<typeof useSystemForm>;

/** The formulas of a group in the builder's order, any the builder does not offer kept at the end. */
function ordered(group: ComponentGroup, formulas: readonly string[]): string[] {
  return [...ORDER[group].filter((f) => formulas.includes(f)), ...formulas.filter((f) => !ORDER[group].includes(f))];
}

/** A number as a person would type it: up to 6 significant figures, no trailing noise. */
function amountText(value: number): string {
  return Number.isFinite(value) ? String(Number(value.toPrecision(6))) : '';
}

function knownFields(chosen: readonly string[]): string[] {
  return [...FIXED_FIELDS, ...chosen.map((f) => `totals.${f}`)];
}

/** Units a total may be typed in: the mass ones count the ion's own formula (g/L of Ag for Ag+, of CN for CN-). */
export const TOTAL_UNITS = ['mol/L', 'mmol/L', 'g/L', 'mg/L', 'oz/gal', 'troy oz/gal'] as const;
export type TotalUnit = (typeof TOTAL_UNITS)[number];

/** A total in mol/L from a value in `unit` of the component `formula`. */
export function toMolPerLitre(value: number, unit: TotalUnit, formula: string): number {
  return unit === 'mol/L' ? value : convertConcentration(value, unit, 'mol/L', { formula }).toNumber();
}
