/** A run that cannot go on: a non-finite value or a collapsing time step, located in time and space. */
export class NumericalFailure extends Error {
  constructor(
    message: string,
    /** Model year at which the failure was detected [a]. */
    readonly year: number,
    /** Position along the flowline [m], when known. */
    readonly position: number | undefined,
  ) {
    super(message);
    this.name = 'NumericalFailure';
  }
}
