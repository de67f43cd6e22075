/**
 * Running sum with Neumaier's compensation (Neumaier 1974, ZAMM 54; an improved Kahan sum), so
 * that a mass budget over millions of time steps closes to round-off.
 */
export class CompensatedSum {
  private sum = 0;
  private compensation = 0;

  add(value: number): void {
    const t = this.sum + value;
    if (Math.abs(this.sum) >= Math.abs(value)) this.compensation += this.sum - t + value;
    else this.compensation += value - t + this.sum;
    this.sum = t;
  }

  get value(): number {
    return this.sum + this.compensation;
  }
}
