import { useState } from 'react';

import { CalculatorFrame, type ParamsBase, type ParamsCheck } from '@/components/screens/calculators/calculator-frame';
import { defaultSolid, metalsOf } from '@/components/screens/calculators/frame/solid-choices';

import { HeadroomFields } from './headroom-fields';
import { isHeadroomResult } from './headroom-view';
import { headroomCsv, headroomVerdict, usableUnit, type HeadroomUnit } from './headroom-words';

const FIELDS = ['solid', 'metal'] as const;

/** The solid picked, else the one the chosen metal and ligand form, among those the build offers. */
function solidOf(picked: string | null, { built, form }: ParamsBase): string | null {
  if (picked !== null && built?.availableSolids.includes(picked)) return picked;
  return defaultSolid(built, form.groups.metals, form.groups.ligands);
}

function headroomParams(solid: string | null, metal: string): ParamsCheck {
  if (!solid) return { ok: false, errors: { solid: 'Choose the solid to offer the bath' } };
  return { ok: true, params: { solid, ...(metal ? { metal } : {}) } };
}

/** /calculate/headroom: how much more of a solid a bath dissolves before a solid persists. */
export function HeadroomScreen() {
  const [picked, setPicked] = useState<string | null>(null);
  const [metal, setMetal] = useState('');
  const [unit, setUnit] = useState<HeadroomUnit>('g/L');
  return (
    <CalculatorFrame
      calculator="headroom"
      paramFields={FIELDS}
      params={(base) => headroomParams(solidOf(picked, base), metal)}
      display={{ unit }}
      renderParams={(ctx) => {
        const solid = solidOf(picked, ctx);
        return (
          <HeadroomFields
            ctx={ctx}
            solid={solid}
            onSolid={(s) => {
              setPicked(s);
              setMetal('');
            }}
            metal={metal}
            metals={solid ? metalsOf(ctx.built, solid) : []}
            onMetal={setMetal}
            unit={unit}
            onUnit={setUnit}
          />
        );
      }}
      verdict={(run) => (isHeadroomResult(run.result) ? headroomVerdict(run.result, usableUnit(unit, run.result.metal?.component), run.verdict) : run.verdict)}
      csv={(output, outcome) => (isHeadroomResult(output) ? headroomCsv(outcome.built.problem, output) : null)}
      emptyHint="Choose the ions and their totals, pick the solid, then press Calculate."
    />
  );
}
