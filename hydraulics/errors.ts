/**
 * The one error type the engineering core throws for bad input. `field` names the offending
 * input (dotted path, e.g. `stations.chainageM`) and `index` the array position when there is one,
 * so the API can point the user at the exact row.
 */
export class HydraulicsInputError extends Error {
  readonly field: string;
  readonly index?: number;
  /** The complaint without the field, in SI words. */
  readonly reason: string;
  /** Figures of the complaint in SI, so a screen can restate it in the project's units. */
  readonly values?: { chainageM?: number; fromM?: number; toM?: number };

  constructor(field: string, message: string, index?: number, values?: HydraulicsInputError['values']) {
    super(index === undefined ? `${field}: ${message}` : `${field}[${index}]: ${message}`);
    this.name = 'HydraulicsInputError';
    this.field = field;
    this.index = index;
    this.reason = message;
    this.values = values;
  }
}
