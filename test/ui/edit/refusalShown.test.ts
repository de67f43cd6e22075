import { describe, expect, it } from 'vitest';
import { validateScenario } from '../../../src/scenario/validateScenario';
import { refusalShown } from '../../../src/ui/edit/refusalShown';
import { demoScenario } from '../../../src/state/scenarioStore';

const refusalAt = (scenario: unknown, path: string) => {
  const result = validateScenario(scenario);
  if (result.ok) throw new Error('expected a refusal');
  const found = result.errors.find((e) => e.path === path);
  if (!found) throw new Error(`no refusal at ${path}: ${result.errors.map((e) => e.path).join(', ')}`);
  return found.message;
};

describe('refusalShown', () => {
  it('restates a number field refusal in the shown scale and unit (the file says per m, the field per 100 m)', () => {
    const message = refusalAt({ ...demoScenario, massBalance: { ...demoScenario.massBalance, ablationGradient: 0.2 } }, '/massBalance/ablationGradient');
    expect(message).toBe('0.2 is not allowed; the ablation gradient must be a finite number greater than 0 and at most 0.1 (m w.e. a^-1) m^-1');
    expect(refusalShown(message, 100, 'm w.e. a⁻¹ per 100 m')).toBe(
      '20 is not allowed; the ablation gradient must be a finite number greater than 0 and at most 10 m w.e. a⁻¹ per 100 m',
    );
  });

  it('leaves a message that states no range of its own as the validator wrote it', () => {
    const message = refusalAt({ ...demoScenario, run: { years: 10, outputEvery: 20 } }, '/run/outputEvery');
    expect(refusalShown(message, 1000, 'km')).toBe(message);
  });

  it('quotes the point before an out-of-order point in the unit and row the table shows', () => {
    const bed = demoScenario.bed.map((p) => [...p]);
    bed[2][0] = bed[0][0];
    const path = '/bed/2/0';
    const message = refusalAt({ ...demoScenario, bed }, path);
    const previous = demoScenario.bed[1][0];
    expect(message).toContain('(1000 at index 1)');
    expect(refusalShown(message, 1 / 1000, 'km')).toBe(message.replace('(1000 at index 1)', `(${previous / 1000} km in row 2)`));
  });
});
