// The one error the calculators throw: input a calculator cannot use. Non-convergence of the engine
// is never thrown; it comes back in a result's status.

/** Invalid calculator input, with the field to fix (e.g. "sweep.points", "steps[2].mol"). */
export class CalculatorInputError extends Error {
  readonly field: string;

  constructor(field: string, message: string) {
    super(`${field}: ${message}`);
    this.name = 'CalculatorInputError';
    this.field = field;
  }
}
