/**
 * A small run to draw figures from: the invented Quorrel cirque, validated and run with the
 * engine as the command line runs it.
 */
import { JSDOM } from 'jsdom';
import { figureRunFromReport, type FigureRun } from '../../src/figures/figureRun';
import { validateScenario } from '../../src/scenario/validateScenario';
import { runScenario } from '../../src/model/runScenario';
import type { Scenario } from '../../src/model/scenario';
import { quorrelCirque } from '../helpers/quorrelCirque';

// A jsdom window for its XML parser only, so the tests run in plain Node (file URLs stay Node's).
const xmlWindow = new JSDOM('').window;

export const TEST_VERSION = '9.8.7-test';

export function scenarioOf(json: Record<string, unknown>): Scenario {
  const result = validateScenario(json);
  if (!result.ok) throw new Error(`fixture scenario invalid: ${JSON.stringify(result.errors)}`);
  return result.scenario;
}

export function cirqueRun(changes: Record<string, unknown> = {}): FigureRun {
  const scenario = scenarioOf(quorrelCirque(changes));
  return figureRunFromReport(runScenario(scenario), scenario, TEST_VERSION);
}

/** Parses SVG text as XML (jsdom's DOMParser) and fails on any XML error. */
export function parseSvg(svg: string): Document {
  const doc = new xmlWindow.DOMParser().parseFromString(svg, 'image/svg+xml');
  const error = doc.getElementsByTagName('parsererror')[0];
  if (error) throw new Error(`not well-formed XML: ${error.textContent}`);
  return doc;
}

/** All text of the figure, with tspans joined as a reader would see them. */
export function textsOf(doc: Document): string[] {
  return Array.from(doc.getElementsByTagName('text'), (t) => t.textContent ?? '');
}
