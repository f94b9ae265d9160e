import { CalculatorFrame } from '@/components/screens/calculators/calculator-frame';
import { csvName } from '@/components/screens/calculators/frame/csv';
import { curvesToCsv } from '@/lib/calculators/curves-csv';
import { type SystemRequest } from '@/shared/constants';

import { isCurve } from './curve-groups';
import { CurvesFieldsView } from './curves-fields';
import { runCurveInChunks } from './run-in-chunks';
import { curvesParams, useCurvesForm } from './use-curves-form';

const FIELDS = ['variable', 'from', 'to', 'points', 'spacing', 'series'] as const;

/** An engine field ("sweep.from", "series[1].name", "variable.component") as the field it sits beside. */
function curvesField(field: string): string {
  const f = field.replace(/^sweep\./, '');
  if (f.startsWith('variable')) return 'variable';
  if (f.startsWith('series')) return 'series';
  return f;
}

/** A pH sweep needs H+ in the system: without a measured pH, the start of the sweep stands in (the sweep replaces it). */
function withPhForSweep(request: SystemRequest, params: Record<string, unknown>): SystemRequest {
  const variable = params.variable as { kind?: string } | undefined;
  if (variable?.kind !== 'pH' || request.pH !== undefined) return request;
  const from = typeof params.from === 'number' && Number.isFinite(params.from) ? params.from : 7;
  return { ...request, pH: Math.max(-2, Math.min(16, from)) };
}

/** The verdict as a sentence: "Total Ag+ from ...", while "pH from ..." keeps its small p. */
function sentenceCase(text: string): string {
  return /^pH\b/.test(text) ? text : text.charAt(0).toUpperCase() + text.slice(1);
}

/** /calculate/curves: one input swept over a range, drawn as charts, with the data as CSV. */
export function CurvesScreen() {
  const curves = useCurvesForm();
  return (
    <CalculatorFrame
      calculator="curves"
      live={curves.live}
      paramFields={FIELDS}
      paramField={curvesField}
      params={(base) => curvesParams(curves.resolve(base))}
      renderParams={(ctx) => <CurvesFieldsView ctx={ctx} form={curves} fields={curves.resolve(ctx)} />}
      adjustSystem={withPhForSweep}
      runner={runCurveInChunks}
      verdict={(run) => sentenceCase(run.verdict)}
      csv={(output) => (isCurve(output) ? { filename: csvName('curve', output.axis.label), text: curvesToCsv(output) } : null)}
      emptyHint="Choose the ions and their totals: the chart draws itself as you type (short sweeps), or press Calculate."
    />
  );
}
