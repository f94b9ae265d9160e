import { CalculatorFrame } from '@/components/screens/calculators/calculator-frame';

const NO_FIELDS = [] as const;

/** /calculate/speciation: where each metal and ligand sits, on the calculator frame (so it starts from a bath too). */
export function SpeciationScreen() {
  return (
    <CalculatorFrame
      calculator="speciation"
      paramFields={NO_FIELDS}
      params={{ ok: true, params: {} }}
      renderParams={() => null}
      emptyHint="Choose the ions and their totals (or start from a bath), then press Calculate."
    />
  );
}
