/** Ice: flow-law exponent, rate factor (given, or from temperature with the resulting A shown), density. */
import type { IceSpec, Scenario } from '../../model/scenario';
import { rateFactorFromTemperature } from '../../model/physics/rateFactor';
import { useScenarioStore } from '../../state/scenarioStore';
import { formatScientific } from '../../chart/formatScientific';
import { rateFactorUnit } from '../../chart/flowUnits';
import { commitEdit } from './commitEdit';
import { ScenarioNumberField } from './ScenarioNumberField';
import { withKey } from './withKey';

const setIce = (s: Scenario, ice: IceSpec): Scenario => ({ ...s, ice });

export function IceParameters() {
  const ice = useScenarioStore((s) => s.scenario.ice);
  const fromTemperature = ice.temperature !== undefined;
  const aUnit = rateFactorUnit(ice.n);

  function chooseSource(temperature: boolean) {
    if (temperature === fromTemperature) return;
    const s = useScenarioStore.getState().scenario;
    // Switching keeps the flow as it is: temperate ice (0 °C) from a given A, the computed A from a temperature.
    const { A: _A, temperature: _T, enhancement: _E, ...rest } = s.ice;
    const next: IceSpec = temperature
      ? { ...rest, temperature: 0 }
      : { ...rest, A: Number(rateFactorFromTemperature(s.ice.temperature ?? 0, s.ice.enhancement ?? 1).toPrecision(3)) };
    commitEdit(setIce(s, next), temperature ? 'Rate factor from temperature' : 'Rate factor given');
  }

  return (
    <fieldset className="param-group">
      <legend>Ice</legend>
      <ScenarioNumberField
        label="Flow-law exponent n"
        unit="–"
        path="/ice/n"
        value={ice.n}
        build={(s, v) => setIce(s, { ...s.ice, n: v as number })}
        help="Glen's exponent, 1 to 5; 3 is the usual value (Cuffey & Paterson 2010, sec. 3.3)."
      />
      <div className="field" role="radiogroup" aria-label="Rate factor given as">
        <span className="field-label">Rate factor given as</span>
        <label>
          <input type="radio" name="rate-factor-source" checked={!fromTemperature} onChange={() => chooseSource(false)} /> A directly
        </label>
        <label>
          <input type="radio" name="rate-factor-source" checked={fromTemperature} onChange={() => chooseSource(true)} /> ice temperature
        </label>
      </div>
      {fromTemperature ? (
        <>
          <ScenarioNumberField
            label="Ice temperature"
            unit="°C"
            path="/ice/temperature"
            value={ice.temperature}
            build={(s, v) => setIce(s, { ...s.ice, temperature: v as number })}
            help="Below the pressure-melting point, −60 to 0; 0 is temperate ice. A from the Arrhenius relation (Cuffey & Paterson 2010, sec. 3.4.6)."
          />
          <ScenarioNumberField
            label="Enhancement factor E"
            unit="–"
            path="/ice/enhancement"
            value={ice.enhancement}
            optional
            build={(s, v) => setIce(s, withKey(s.ice, 'enhancement', v))}
            help="Multiplies A, above 0 and at most 100; default 1 (isotropic ice)."
          />
          <p className="derived" aria-live="polite">
            Resulting A = {formatScientific(rateFactorFromTemperature(ice.temperature ?? 0, ice.enhancement ?? 1))} {aUnit}
          </p>
        </>
      ) : (
        <ScenarioNumberField
          label="Rate factor A"
          unit={aUnit}
          path="/ice/A"
          value={ice.A}
          build={(s, v) => setIce(s, { ...s.ice, A: v as number })}
          help="Above 0; for n = 3 at most 1e-20. Temperate ice: 2.4e-24 Pa⁻³ s⁻¹ (Cuffey & Paterson 2010, Table 3.4)."
        />
      )}
      <ScenarioNumberField
        label="Ice density"
        unit="kg m⁻³"
        path="/ice/density"
        value={ice.density}
        optional
        build={(s, v) => setIce(s, withKey(s.ice, 'density', v))}
        help="800 to 1000; default 910. Bulk glacier ice is 830–917 (Cuffey & Paterson 2010, ch. 2)."
      />
    </fieldset>
  );
}
