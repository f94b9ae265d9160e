// The one error the engine throws: a problem that cannot be solved as written. Non-convergence is
// never thrown; it comes back as a result status.

/** Invalid input, with the problem field to fix (e.g. "species[2].stoich.Cl-"). */
export class EngineInputError extends Error {
  readonly field: string;

  constructor(field: string, message: string) {
    super(`${field}: ${message}`);
    this.name = 'EngineInputError';
    this.field = field;
  }
}
