/**
 * The one error type the engineering core throws for bad input. `field` names the offending
 * input (dotted path, e.g. `stations.chainageM`) and `index` the array position when there is one,
 * so the API can point the user at the exact row.
 */
export class HydraulicsInputError extends Error {
  readonly field: string;
  readonly index?: number;

  constructor(field: string, message: string, index?: number) {
    super(index === undefined ? `${field}: ${message}` : `${field}[${index}]: ${message}`);
    this.name = 'HydraulicsInputError';
    this.field = field;
    this.index = index;
  }
}
