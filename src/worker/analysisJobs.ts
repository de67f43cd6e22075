/**
 * Each analysis request as a stepwise computation (src/model/analysis, stepwise.ts) that ends in
 * the result message's payload. Kept apart from the driver so the driver stays about slicing.
 */
import { calibrateParameter } from '../model/analysis/calibrateParameter';
import { bedFromSurfaceSteps } from '../model/analysis/bedFromSurface';
import { calibrateTerminusSteps } from '../model/analysis/calibrateTerminus';
import { committedChangeSteps } from '../model/analysis/committedChange';
import { sensitivityCurveSteps, warmingLadder } from '../model/analysis/sensitivityCurve';
import type { AnalysisSteps } from '../model/analysis/stepwise';
import { createFlowlineModel } from '../model/createFlowlineModel';
import type { AnalysisRequest, AnalysisResult, FlowlineFacts } from './analysisProtocol';

export function analysisSteps(request: AnalysisRequest): AnalysisSteps<AnalysisResult> {
  const model = createFlowlineModel(request.scenario);
  const facts: FlowlineFacts = { domainLength: model.grid.cellCount * model.grid.spacing, spacing: model.grid.spacing };
  switch (request.kind) {
    case 'committed':
      return (function* () {
        const thickness = Float64Array.from(request.thickness);
        if (thickness.length !== model.grid.cellCount) {
          throw new Error(`the glacier given has ${thickness.length} cells but the scenario's grid has ${model.grid.cellCount}`);
        }
        const committed = yield* committedChangeSteps(model, thickness, model.warmingAt(request.year), request.year);
        return { kind: 'committed' as const, committed, ...facts };
      })();
    case 'sensitivity':
      return (function* () {
        const { from, to, step } = request;
        const points = yield* sensitivityCurveSteps(model, model.initialThickness, warmingLadder(from, to, step));
        return { kind: 'sensitivity' as const, points, from, to, step, ...facts };
      })();
    case 'calibration':
      return (function* () {
        const { observedTerminus, tolerance } = request;
        const calibration = yield* calibrateTerminusSteps(request.scenario, { observedTerminus, tolerance });
        return { kind: 'calibration' as const, calibration, observedTerminus, tolerance, ...facts };
      })();
    case 'fit':
      // Not sliced: a terminus fit takes under a second, a record fit about 0.3 s (measured on
      // the demo valley), so Cancel is heard before the fit starts and after it ends.
      return (function* () {
        yield { fraction: undefined, message: `fitting ${request.pointer} to ${request.observation}` };
        const fit = calibrateParameter(request.scenario, request.pointer, { observation: request.observation });
        return { kind: 'fit' as const, fit, ...facts };
      })();
    case 'inversion':
      return (function* () {
        const { smoothingMetres, fitRateFactor } = request;
        const bed = yield* bedFromSurfaceSteps(request.scenario, { smoothingMetres, fitRateFactor });
        return { kind: 'inversion' as const, bed, ...facts };
      })();
  }
}
