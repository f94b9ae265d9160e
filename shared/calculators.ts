// The calculators by key, with what each is for (shared by the library's runs and the calculations).
export const CALCULATOR_KEYS = ['headroom', 'fixer_loading', 'speciation', 'curves', 'precipitation_order', 'dosing_plan', 'make_up'] as const;
export type CalculatorKey = (typeof CALCULATOR_KEYS)[number];

export const CALCULATOR_LABELS: Record<CalculatorKey, { label: string; does: string }> = {
  headroom: { label: 'Headroom', does: 'How much more of a solid the bath dissolves before a solid persists' },
  fixer_loading: { label: 'Fixer loading', does: 'How much more silver halide a thiosulfate fixer takes, and how loaded it is' },
  speciation: { label: 'Speciation', does: 'Where each metal and ligand sits at equilibrium' },
  curves: { label: 'Curves', does: 'Any input swept over a range, drawn as charts with the data as CSV' },
  precipitation_order: { label: 'Precipitation order', does: 'Which metal drops first as a precipitant is dosed, and what is left of each' },
  dosing_plan: { label: 'Dosing plan', does: 'Additions step by step, with the state after each' },
  make_up: { label: 'Make-up', does: 'How much salt to add to a tank to reach a free ligand or a headroom' },
};
