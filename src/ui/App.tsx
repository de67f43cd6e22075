/** First slice of the workbench: the open scenario's long profile and its parameters. */
import { useScenarioStore } from '../state/scenarioStore';
import { CautionNotice } from './CautionNotice';
import { LongProfileView } from './LongProfileView';
import { ParameterSummary } from './ParameterSummary';

export function App() {
  const scenario = useScenarioStore((s) => s.scenario);
  return (
    <div className="app">
      <header className="app-header">
        <h1>Firnline</h1>
        <p className="scenario-name" aria-label="Scenario">
          {scenario.name ?? 'Untitled scenario'}
        </p>
      </header>
      <main className="workbench">
        <section className="profile" aria-labelledby="profile-heading">
          <h2 id="profile-heading">Long profile, initial state</h2>
          <LongProfileView scenario={scenario} />
        </section>
        <ParameterSummary scenario={scenario} />
      </main>
      <footer className="app-footer">
        <CautionNotice />
      </footer>
    </div>
  );
}
