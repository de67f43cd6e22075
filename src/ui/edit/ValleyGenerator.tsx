/** Generates a synthetic valley bed from a few numbers; the result replaces the bed as one undoable edit. */
import { useState } from 'react';
import { piecewiseLinear } from '../../model/piecewiseLinear';
import { useScenarioStore } from '../../state/scenarioStore';
import { commitEdit, refusalAt } from './commitEdit';
import { generatedValleyScenario } from './generatedValleyScenario';
import { LocalNumberInput } from './LocalNumberInput';
import { readFormNumbers } from './readFormNumbers';
import { NotApplied } from './NotApplied';

const km = (m: number) => String(Number((m / 1000).toFixed(2)));

export function ValleyGenerator() {
  const [initial] = useState(() => {
    const s = useScenarioStore.getState().scenario;
    const bedAt = piecewiseLinear(s.bed);
    const L = s.grid.length;
    return {
      head: String(Math.round(bedAt(0))),
      foot: String(Math.round(bedAt(L))),
      length: km(L),
      concavity: '1.5',
      odPosition: km(L * 0.5),
      odDepth: '100',
      odLength: km(L * 0.2),
      stepPosition: km(L * 0.7),
      stepHeight: '80',
    };
  });
  const [f, setF] = useState(initial);
  const [overdeepening, setOverdeepening] = useState(false);
  const [step, setStep] = useState(false);
  const [message, setMessage] = useState<string | null>(null);
  const set = (key: keyof typeof f) => (text: string) => setF({ ...f, [key]: text });

  function generate() {
    const base = readFormNumbers({
      head: { label: 'Head elevation', unit: 'm a.s.l.', text: f.head, min: -1000, max: 9000 },
      foot: { label: 'Foot elevation', unit: 'm a.s.l.', text: f.foot, min: -1000, max: 9000 },
      length: { label: 'Valley length', unit: 'km', text: f.length, min: 0, above: true, max: 1000 },
      concavity: { label: 'Concavity exponent', text: f.concavity, min: 0.3, max: 5 },
    });
    if (!base.ok) return setMessage(base.errors.join('; '));
    const L = base.values.length;
    const od = overdeepening
      ? readFormNumbers({
          position: { label: 'Overdeepening centre', unit: 'km', text: f.odPosition, min: 0, max: L },
          depth: { label: 'Overdeepening depth', unit: 'm', text: f.odDepth, min: 0, max: 2000 },
          length: { label: 'Overdeepening length', unit: 'km', text: f.odLength, min: 0, above: true, max: L },
        })
      : null;
    const st = step
      ? readFormNumbers({
          position: { label: 'Step position', unit: 'km', text: f.stepPosition, min: 0, above: true, max: L },
          height: { label: 'Step height', unit: 'm', text: f.stepHeight, min: 0, max: 2000 },
        })
      : null;
    const errors = [...(od && !od.ok ? od.errors : []), ...(st && !st.ok ? st.errors : [])];
    if (errors.length) return setMessage(errors.join('; '));
    const s = useScenarioStore.getState().scenario;
    const next = generatedValleyScenario(s, {
      headElevation: base.values.head,
      footElevation: base.values.foot,
      length: L * 1000,
      concavity: base.values.concavity,
      overdeepening: od?.ok ? { position: od.values.position * 1000, depth: od.values.depth, length: od.values.length * 1000 } : undefined,
      step: st?.ok ? { position: st.values.position * 1000, height: st.values.height } : undefined,
    });
    const result = commitEdit(next, 'Generate valley');
    setMessage(refusalAt(result));
  }

  return (
    <fieldset className="param-group">
      <legend>Valley generator</legend>
      <p className="field-help">Replaces the bed (one undoable edit) and starts ice-free; the width profile is stretched to the new length.</p>
      <LocalNumberInput label="Head elevation" unit="m a.s.l." value={f.head} onChange={set('head')} />
      <LocalNumberInput label="Foot elevation" unit="m a.s.l." value={f.foot} onChange={set('foot')} />
      <LocalNumberInput label="Valley length" unit="km" value={f.length} onChange={set('length')} />
      <LocalNumberInput label="Concavity exponent" unit="–" value={f.concavity} onChange={set('concavity')}
        help="0.3 to 5: 1 is a straight slope, above 1 steep at the head and gentle down-valley, as most glaciated valleys." />
      <label>
        <input type="checkbox" checked={overdeepening} onChange={(e) => setOverdeepening(e.target.checked)} /> Overdeepening
      </label>
      {overdeepening && (
        <>
          <LocalNumberInput label="Overdeepening centre" unit="km" value={f.odPosition} onChange={set('odPosition')} />
          <LocalNumberInput label="Overdeepening depth" unit="m" value={f.odDepth} onChange={set('odDepth')} help="Below the smooth profile, 0 to 2000." />
          <LocalNumberInput label="Overdeepening length" unit="km" value={f.odLength} onChange={set('odLength')} />
        </>
      )}
      <label>
        <input type="checkbox" checked={step} onChange={(e) => setStep(e.target.checked)} /> Bedrock step
      </label>
      {step && (
        <>
          <LocalNumberInput label="Step position" unit="km" value={f.stepPosition} onChange={set('stepPosition')} />
          <LocalNumberInput label="Step height" unit="m" value={f.stepHeight} onChange={set('stepHeight')} help="Drop down-valley over 100 m, 0 to 2000." />
        </>
      )}
      <button type="button" onClick={generate}>
        Generate valley
      </button>
      <NotApplied message={message} />
    </fieldset>
  );
}
