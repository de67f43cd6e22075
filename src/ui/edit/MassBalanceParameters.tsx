/** Mass balance: the model, its fields, a table editor for b(z) tables and a plot of b(z). */
import type { DegreeDayBalanceSpec, LinearBalanceSpec, MassBalanceSpec, Scenario, TableBalanceSpec } from '../../model/scenario';
import { useScenarioStore } from '../../state/scenarioStore';
import { BalanceProfilePlot } from './BalanceProfilePlot';
import { commitEdit } from './commitEdit';
import { defaultBalance } from './defaultBalances';
import { PointTableEditor } from './PointTableEditor';
import { ScenarioNumberField } from './ScenarioNumberField';
import { withKey } from './withKey';

const MODELS: { value: MassBalanceSpec['model']; label: string }[] = [
  { value: 'linear', label: 'Linear in elevation around an ELA' },
  { value: 'table', label: 'Table b(z)' },
  { value: 'degree-day', label: 'Degree-day melt and snowfall' },
];

const SENSITIVITY_HELP = 'ELA rise per kelvin of warming, 0 to 1000; default 100. Observed ~100–130 m K⁻¹ (Ambach 1989; Larocca et al. 2024).';
const PRECIPITATION_HELP =
  '−20 to 30; empty: 0. Compounded: factor (1 + p/100) per kelvin. About 7 from Clausius–Clapeyron; 1–3 for global mean precipitation (Held & Soden 2006).';
const GRADIENT_UNIT = 'm w.e. a⁻¹ per 100 m';

function setBalance<T extends MassBalanceSpec>(s: Scenario, mb: T): Scenario {
  return { ...s, massBalance: mb };
}

export function MassBalanceParameters() {
  const mb = useScenarioStore((s) => s.scenario.massBalance);
  return (
    <fieldset className="param-group">
      <legend>Mass balance</legend>
      <div className="field">
        <label htmlFor="balance-model">Mass-balance model</label>
        <select
          id="balance-model"
          value={mb.model}
          onChange={(e) => {
            const s = useScenarioStore.getState().scenario;
            const model = e.target.value as MassBalanceSpec['model'];
            commitEdit(setBalance(s, defaultBalance(s, model)), `Mass balance: ${model}`);
          }}
        >
          {MODELS.map((m) => (
            <option key={m.value} value={m.value}>
              {m.label}
            </option>
          ))}
        </select>
      </div>
      {mb.model === 'linear' && <LinearFields mb={mb} />}
      {mb.model === 'table' && <TableFields mb={mb} />}
      {mb.model === 'degree-day' && <DegreeDayFields mb={mb} />}
      <BalanceProfilePlot />
    </fieldset>
  );
}

function LinearFields({ mb }: { mb: LinearBalanceSpec }) {
  const b = (key: keyof LinearBalanceSpec) => (s: Scenario, v: number | undefined) =>
    setBalance(s, withKey(s.massBalance as LinearBalanceSpec, key, v as never));
  return (
    <>
      <ScenarioNumberField label="ELA" unit="m a.s.l." path="/massBalance/ela" value={mb.ela} build={b('ela')}
        help="Equilibrium-line altitude at zero warming, −1000 to 10,000." />
      <ScenarioNumberField label="Ablation gradient (below the ELA)" unit={GRADIENT_UNIT} displayScale={100} path="/massBalance/ablationGradient"
        value={mb.ablationGradient} build={b('ablationGradient')}
        help="Above 0, at most 10. Maritime glaciers 0.5–1.0 (Cuffey & Paterson 2010, ch. 4)." />
      <ScenarioNumberField label="Accumulation gradient (above the ELA)" unit={GRADIENT_UNIT} displayScale={100} optional
        path="/massBalance/accumulationGradient" value={mb.accumulationGradient} build={b('accumulationGradient')}
        help="0 to 10; empty: same as below. Often smaller than in the ablation area." />
      <ScenarioNumberField label="Largest accumulation" unit="m w.e. a⁻¹" optional path="/massBalance/maxAccumulation"
        value={mb.maxAccumulation} build={b('maxAccumulation')} help="Cap on b above the ELA, above 0 and at most 20; empty: no cap." />
      <ScenarioNumberField label="ELA sensitivity to warming" unit="m K⁻¹" optional path="/massBalance/elaSensitivity"
        value={mb.elaSensitivity} build={b('elaSensitivity')} help={SENSITIVITY_HELP} />
      <ScenarioNumberField label="Accumulation change per K of warming" unit="% K⁻¹" optional path="/massBalance/precipitationPerK"
        value={mb.precipitationPerK} build={b('precipitationPerK')} help={PRECIPITATION_HELP} />
    </>
  );
}

function TableFields({ mb }: { mb: TableBalanceSpec }) {
  return (
    <>
      <PointTableEditor
        caption="Balance table"
        columns={[{ label: 'Elevation', unit: 'm a.s.l.' }, { label: 'Balance', unit: 'm w.e. a⁻¹' }]}
        points={mb.points}
        path="/massBalance/points"
        build={(s, points) => setBalance(s, { ...(s.massBalance as TableBalanceSpec), points })}
        minPoints={2}
        addStep={100}
      />
      <p className="field-help">Elevations strictly increasing, −1000 to 10,000; balance −100 to 100; constant beyond the ends.</p>
      <ScenarioNumberField label="ELA sensitivity to warming" unit="m K⁻¹" optional path="/massBalance/elaSensitivity"
        value={mb.elaSensitivity} build={(s, v) => setBalance(s, withKey(s.massBalance as TableBalanceSpec, 'elaSensitivity', v))}
        help={`Upward shift of the table per kelvin. ${SENSITIVITY_HELP}`} />
      <ScenarioNumberField label="Accumulation change per K of warming" unit="% K⁻¹" optional path="/massBalance/precipitationPerK"
        value={mb.precipitationPerK}
        build={(s, v) => setBalance(s, withKey(s.massBalance as TableBalanceSpec, 'precipitationPerK', v))}
        help={PRECIPITATION_HELP} />
    </>
  );
}

const DEGREE_DAY_FIELDS: { key: keyof Omit<DegreeDayBalanceSpec, 'model' | 'precipitationPerK' | 'dailyTemperatureSd' | 'refreezingFraction'>; label: string; unit: string; help: string; scale?: number }[] = [
  { key: 'referenceElevation', label: 'Reference elevation', unit: 'm a.s.l.', help: 'Where the temperature and precipitation below apply, −1000 to 10,000.' },
  { key: 'meanTemperature', label: 'Annual mean air temperature', unit: '°C', help: 'At the reference elevation, −60 to 40.' },
  { key: 'amplitude', label: 'Annual temperature amplitude', unit: 'K', help: 'Half the range of the annual cycle, 0 to 40.' },
  { key: 'lapseRate', label: 'Temperature lapse rate', unit: 'K per km', scale: 1000, help: '0 to 15; 6.5 is the standard atmosphere (ICAO).' },
  { key: 'precipitation', label: 'Annual precipitation', unit: 'm w.e. a⁻¹', help: 'At the reference elevation, 0 to 20.' },
  { key: 'precipitationGradient', label: 'Precipitation increase with height', unit: '% per 100 m', scale: 10_000, help: '−50 to 50; about 5 is common practice.' },
  { key: 'snowThreshold', label: 'Snow/rain threshold', unit: '°C', help: 'Precipitation falls as snow below it, −10 to 10; about 1 (common practice).' },
  { key: 'ddfSnow', label: 'Degree-day factor, snow', unit: 'mm w.e. d⁻¹ K⁻¹', help: 'Above 0, at most 50; typically 3–5 (Braithwaite 2008; Hock 2003).' },
  { key: 'ddfIce', label: 'Degree-day factor, ice', unit: 'mm w.e. d⁻¹ K⁻¹', help: 'Above 0, at most 50; typically ~8 (Braithwaite 2008; Hock 2003).' },
];

function DegreeDayFields({ mb }: { mb: DegreeDayBalanceSpec }) {
  return (
    <>
      {DEGREE_DAY_FIELDS.map((f) => (
        <ScenarioNumberField
          key={f.key}
          label={f.label}
          unit={f.unit}
          displayScale={f.scale}
          path={`/massBalance/${f.key}`}
          value={mb[f.key]}
          build={(s, v) => setBalance(s, { ...(s.massBalance as DegreeDayBalanceSpec), [f.key]: v as number })}
          help={f.help}
        />
      ))}
      <ScenarioNumberField label="Precipitation change per K of warming" unit="% K⁻¹" optional path="/massBalance/precipitationPerK"
        value={mb.precipitationPerK}
        build={(s, v) => setBalance(s, withKey(s.massBalance as DegreeDayBalanceSpec, 'precipitationPerK', v))}
        help={PRECIPITATION_HELP} />
      <ScenarioNumberField label="Temperature spread about the annual cycle" unit="K" optional path="/massBalance/dailyTemperatureSd"
        value={mb.dailyTemperatureSd}
        build={(s, v) => setBalance(s, withKey(s.massBalance as DegreeDayBalanceSpec, 'dailyTemperatureSd', v))}
        help="Standard deviation of daily air temperature, 0 to 10; empty: 0 (no spread). About 4–5 is common practice (Calov & Greve 2005)." />
      <ScenarioNumberField label="Refreezing share of melt and rain" unit="%" displayScale={100} optional path="/massBalance/refreezingFraction"
        value={mb.refreezingFraction}
        build={(s, v) => setBalance(s, withKey(s.massBalance as DegreeDayBalanceSpec, 'refreezingFraction', v))}
        help="0 to 100; empty: 0. Refrozen mass at most 60 % of the year's snowfall (Reeh 1991)." />
    </>
  );
}
