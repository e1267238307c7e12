/** Parse and limit problems: the API turns these into HTTP 422, the CLI into "error: ...". */
export type ChemInputErrorCode = 'empty' | 'unparsable' | 'too_large' | 'unsupported_element' | 'unsupported_feature';

export class ChemInputError extends Error {
  readonly code: ChemInputErrorCode;

  constructor(code: ChemInputErrorCode, message: string) {
    super(message);
    this.name = 'ChemInputError';
    this.code = code;
  }
}
