import { useState } from 'react';

import { useTankVolume } from '@/components/screens/calculators/dosing-plan/use-bath-volume';
import { CalculatorFrame } from '@/components/screens/calculators/calculator-frame';

import { MakeUpFields } from './make-up-fields';
import { isMakeUpResult, makeUpCsv, makeUpVerdict, type MassChoice } from './make-up-words';
import { makeUpParams, resolveMakeUp, useMakeUpDraft } from './use-make-up-form';

const FIELDS = ['volume', 'salt', 'target', 'massUnit'] as const;

/** "volume.value" → "volume", "salt.stoich.Na+" → "salt", "target.molPerL" → "target". */
function makeUpField(field: string): string {
  return field.split('.')[0] ?? field;
}

/** /calculate/make-up: how much salt (or ammonia solution) to add to a tank to reach a free ligand level or a headroom. */
export function MakeUpScreen() {
  const tank = useTankVolume();
  const { draft, set } = useMakeUpDraft();
  const [massUnit, setMassUnit] = useState<MassChoice>('kg');
  return (
    <CalculatorFrame
      calculator="make_up"
      paramFields={FIELDS}
      paramField={makeUpField}
      params={(base) => makeUpParams(draft, resolveMakeUp(draft, base), tank)}
      display={{ massUnit }}
      renderParams={(ctx) => <MakeUpFields ctx={ctx} tank={tank} draft={draft} set={set} resolved={resolveMakeUp(draft, ctx)} massUnit={massUnit} onMassUnit={setMassUnit} />}
      verdict={(run, outcome) => (isMakeUpResult(run.result) ? makeUpVerdict(run.result, { ...outcome.params, massUnit }, run.verdict) : run.verdict)}
      csv={(output, outcome) => (isMakeUpResult(output) ? makeUpCsv(output, { ...outcome.params, massUnit }) : null)}
      emptyHint="Describe the bath, give the tank volume, pick the salt and the target, then press Calculate."
    />
  );
}
