import { useMemo } from 'react';

import { useThresholdValues } from '@/lib/api/use-safety';
import { calculationHazards } from '@/lib/hazards';
import { type CalculatorKey } from '@/shared/calculators';
import { type ProblemJson, systemRequestSchema, type SystemRequest } from '@/shared/constants';
import { type Hazard } from '@/shared/safety';

/** A calculation as the screen holds it: the request, what the library built, the params and the calculator's answer. */
export type ShownCalculation = { calculator: CalculatorKey; request: SystemRequest; problem: ProblemJson; params: unknown; result?: unknown };

/**
 * What the hazard rules find on a calculation shown on screen, with the shop's thresholds (the
 * built-in ones until they load); the server finds the same when the run is saved.
 */
export function useCalculationHazards(shown: ShownCalculation | null): Hazard[] {
  const { values } = useThresholdValues();
  return useMemo(() => {
    if (!shown) return [];
    const system = systemRequestSchema.safeParse(shown.request);
    if (!system.success) return [];
    return calculationHazards({ calculator: shown.calculator, system: system.data, params: shown.params, problem: shown.problem, outcome: shown.result === undefined ? null : { result: shown.result } }, values);
  }, [shown, values]);
}
