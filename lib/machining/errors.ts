/** Thrown for input the engine cannot compute with; `field` names the offending input. */
export class MachiningInputError extends Error {
  readonly field: string;

  constructor(field: string, message: string) {
    super(message);
    this.name = "MachiningInputError";
    this.field = field;
  }
}

export const isMachiningInputError = (error: unknown): error is MachiningInputError => error instanceof MachiningInputError;
