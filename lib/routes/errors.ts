/**
 * Why a route edit was refused. `pointNumber` is 1-based, as the points table shows it, so the
 * message can say "point 12" and the screen can scroll to it.
 */
export class RouteEditError extends Error {
  readonly field: string;
  readonly pointNumber?: number;
  /** 'conflict' when the route changed under the edit (answered 409), else 'invalid' (400). */
  readonly kind: 'invalid' | 'conflict';

  constructor(field: string, message: string, options: { pointNumber?: number; kind?: 'invalid' | 'conflict' } = {}) {
    super(options.pointNumber === undefined ? message : `point ${options.pointNumber}: ${message}`);
    this.name = 'RouteEditError';
    this.field = field;
    this.pointNumber = options.pointNumber;
    this.kind = options.kind ?? 'invalid';
  }
}
