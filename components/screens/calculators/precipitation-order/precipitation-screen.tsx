import { useState } from 'react';

import { parseAmount } from '@/components/screens/calculate/use-system-form';
import { CalculatorFrame, type ParamsBase, type ParamsCheck } from '@/components/screens/calculators/calculator-frame';
import { solidStoich } from '@/components/screens/calculators/frame/solid-choices';

import { PrecipitationFields } from './precipitation-fields';
import { isPrecipitationResult, precipitationCsv, readableVerdict } from './precipitation-words';

const FIELDS = ['precipitant', 'cations', 'maxPrecipitantMolPerL'] as const;

/** "cations[1]" → "cations". */
function precipitationField(field: string): string {
  return field.replace(/\[\d+\]$/, '').replace(/\.\d+$/, '');
}

/** The precipitant picked, else the first ligand that forms a solid with a chosen metal, else the first ligand. */
function precipitantOf(picked: string | null, { built, form }: ParamsBase): string | null {
  const ligands = form.groups.ligands;
  if (picked !== null && ligands.includes(picked)) return picked;
  const forms = (l: string) => (built?.availableSolids ?? []).some((s) => (solidStoich(built, s)[l] ?? 0) > 0);
  return ligands.find(forms) ?? ligands[0] ?? null;
}

type Choice = { precipitant: string | null; cations: string[]; max: string };

function precipitationParams({ precipitant, cations, max }: Choice): ParamsCheck {
  const errors: Record<string, string> = {};
  if (!precipitant) errors.precipitant = 'Choose the ligand dosed as the precipitant (add it among the ligands above)';
  if (cations.length === 0) errors.cations = 'Follow at least one metal ion';
  const most = parseAmount(max);
  if (most !== undefined && !(most > 0)) errors.maxPrecipitantMolPerL = 'Must be a number of mol/L above 0 (or leave it empty)';
  if (Object.keys(errors).length > 0 || !precipitant) return { ok: false, errors };
  return { ok: true, params: { precipitant, cations, ...(most !== undefined ? { maxPrecipitantMolPerL: most } : {}) } };
}

/** /calculate/precipitation-order: which metal comes out first as a precipitant is dosed, and what is left of each. */
export function PrecipitationOrderScreen() {
  const [picked, setPicked] = useState<string | null>(null);
  const [skipped, setSkipped] = useState<string[]>([]);
  const [max, setMax] = useState('');
  const choose = (base: ParamsBase): Choice => ({ precipitant: precipitantOf(picked, base), cations: base.form.groups.metals.filter((m) => !skipped.includes(m)), max });
  return (
    <CalculatorFrame
      calculator="precipitation_order"
      paramFields={FIELDS}
      paramField={precipitationField}
      params={(base) => precipitationParams(choose(base))}
      renderParams={(ctx) => {
        const c = choose(ctx);
        return (
          <PrecipitationFields
            ctx={ctx}
            precipitants={ctx.form.groups.ligands}
            precipitant={c.precipitant}
            onPrecipitant={setPicked}
            metals={ctx.form.groups.metals}
            cations={c.cations}
            onToggleCation={(m) => setSkipped((now) => (now.includes(m) ? now.filter((x) => x !== m) : [...now, m]))}
            max={max}
            onMax={setMax}
          />
        );
      }}
      verdict={(run) => readableVerdict(run.verdict)}
      csv={(output) => (isPrecipitationResult(output) ? precipitationCsv(output) : null)}
      emptyHint="Choose the metal ions with their totals and the ligand you dose (its total may be 0), then press Calculate."
    />
  );
}
