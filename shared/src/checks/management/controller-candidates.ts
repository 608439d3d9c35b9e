import type { EngineControllerSpec, FitSpec } from '../../types/fit-spec';

/** Everything the engine asks of a controller. */
export function controllerSuits(spec: FitSpec, controller: EngineControllerSpec): boolean {
  const engine = spec.engine;
  return (
    controller.crankSignals.includes(engine.crankSignal) &&
    controller.camSignals.includes(engine.camSignal) &&
    controller.throttles.includes(engine.throttle) &&
    controller.maxCylinders >= engine.cylinders
  );
}

/** Candidate controllers passing `test`, those that also suit the engine in every other respect first. */
export function controllerCandidateIds(spec: FitSpec, test: (controller: EngineControllerSpec) => boolean): string[] {
  const passing = (spec.candidates?.controllers ?? []).filter(test);
  const full = passing.filter((c) => controllerSuits(spec, c));
  const partial = passing.filter((c) => !controllerSuits(spec, c));
  return [...full, ...partial].map((c) => c.id);
}
