// The one error the units module throws: bad input from a person or a caller, never a bug.

/** Thrown for input the units module cannot use; `field` names the argument to fix, the message says how. */
export class UnitsInputError extends Error {
  readonly field: string;

  constructor(field: string, message: string) {
    super(message);
    this.name = 'UnitsInputError';
    this.field = field;
  }
}
