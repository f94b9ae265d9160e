import { CalculatorFrame } from '@/components/screens/calculators/calculator-frame';

import { DosingFields } from './dosing-fields';
import { dosingCsv, dosingVerdict, isDosingResult } from './dosing-words';
import { useTankVolume } from './use-bath-volume';
import { componentsOf, dosingParams, MAX_STEPS, useDosingSteps } from './use-dosing-form';

const FIELDS = ['volumeL', 'steps', ...Array.from({ length: MAX_STEPS }, (_, i) => `steps.${i}`)] as const;

/** An engine or schema field ("steps[2].mol", "steps.2.stoich.Na+", "vessel.volumeL") as the field it sits beside ("steps.2", "volumeL"). */
function dosingField(field: string): string {
  const step = /^steps(?:\[(\d+)\]|\.(\d+))/.exec(field);
  if (step) return `steps.${step[1] ?? step[2]}`;
  return /^(vessel\.)?volumeL$/.test(field) ? 'volumeL' : field;
}

/** /calculate/dosing-plan: a vessel taken through additions, pH set points and dilutions, with the state after each step. */
export function DosingPlanScreen() {
  const volume = useTankVolume();
  const steps = useDosingSteps();
  return (
    <CalculatorFrame
      calculator="dosing_plan"
      paramFields={FIELDS}
      paramField={dosingField}
      params={(base) => dosingParams(volume.text, volume.unit, steps.steps, componentsOf(base))}
      display={{ volumeUnit: volume.unit }}
      renderParams={(ctx) => <DosingFields ctx={ctx} volume={volume} steps={steps} components={componentsOf(ctx)} />}
      verdict={(run, outcome) => (isDosingResult(run.result) ? dosingVerdict(outcome.built.problem, run.result, { ...outcome.params, volumeUnit: volume.unit }, run.verdict) : run.verdict)}
      csv={(output, outcome) => (isDosingResult(output) ? dosingCsv(outcome.built.problem, output, outcome.params) : null)}
      emptyHint="Describe the solution in the vessel, give its volume, add the steps in order, then press Calculate."
    />
  );
}
