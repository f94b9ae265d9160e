// The result view of each calculator, by key: the calculator screens show them under the verdict,
// and saved runs and their print view show the same view of the stored output. A calculator
// without a view of its own shows the verdict and the equilibrium tables only.
import { type ComponentType } from 'react';

import { SpeciationResult } from '@/components/screens/calculate/speciation-result';
import { CurvesView } from '@/components/screens/calculators/curves/curves-view';
import { DosingView } from '@/components/screens/calculators/dosing-plan/dosing-view';
import { FixerLoadingView } from '@/components/screens/calculators/fixer-loading/fixer-loading-view';
import { HeadroomView } from '@/components/screens/calculators/headroom/headroom-view';
import { MakeUpView } from '@/components/screens/calculators/make-up/make-up-view';
import { PrecipitationView } from '@/components/screens/calculators/precipitation-order/precipitation-view';
import { type CalculatorKey } from '@/shared/calculators';
import { type ProblemJson, type SolveResultJson } from '@/shared/constants';

/** What every result view gets: the built problem, the bath as solved, and the calculator's own output. */
export type ResultViewProps = {
  problem: ProblemJson;
  /** The equilibrium of the bath as given (every calculator has one). */
  result: SolveResultJson;
  /** The calculator's own result (lib/calculators), JSON-safe; null for older runs. */
  output: unknown;
  /** The calculator's parameters as sent. */
  params: Record<string, unknown>;
  /** For print: no interactive parts, charts at a fixed width. */
  print?: boolean;
};

function SpeciationView({ problem, result }: ResultViewProps) {
  const metals = problem.components.filter((c) => c !== 'H+' && /\+\d*$/.test(c) && !['Na+', 'K+'].includes(c));
  return <SpeciationResult problem={problem} result={result} metals={metals} />;
}

/** Views by calculator; each calculator's screen module registers its own here. */
export const RESULT_VIEWS: Partial<Record<CalculatorKey, ComponentType<ResultViewProps>>> = {
  speciation: SpeciationView,
  headroom: HeadroomView,
  fixer_loading: FixerLoadingView,
  curves: CurvesView,
  precipitation_order: PrecipitationView,
  dosing_plan: DosingView,
  make_up: MakeUpView,
};

/** The view for a calculator, or the speciation tables when it has none of its own. */
export function resultViewFor(key: CalculatorKey): ComponentType<ResultViewProps> {
  return RESULT_VIEWS[key] ?? SpeciationView;
}
