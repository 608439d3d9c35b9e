/**
 * Planning against a generated catalog of 10,000 parts: prints the median and spread of planParts (model
 * build, solve with highs, explanations) on the demo fit report. Run: npx tsx bench/parts-plan.bench.ts
 */
import highsLoader from 'highs';
import * as os from 'node:os';
import { runFitCheck } from '../src/fit-report/fit-report';
import { DEMO_FIT_SPEC } from '../src/fixtures/demo-fit-spec';
import { fitSpecAttributes } from '../src/parts-plan/part-attributes';
import { PART_CATEGORIES, type CatalogPartCategory } from '../src/parts-plan/part-categories';
import { planParts, type MipSolve } from '../src/parts-plan/plan-parts';
import type { PlanInput, PlanPart } from '../src/parts-plan/plan-types';

function generatedCatalog(count: number): PlanPart[] {
  let seed = 20261202;
  const random = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648);
  const pick = <T,>(items: readonly T[]) => items[Math.floor(random() * items.length)];
  const c = DEMO_FIT_SPEC.candidates!;
  const parts: PlanPart[] = [];
  for (let i = 0; i < count; i += 1) {
    const category = pick(PART_CATEGORIES.filter((x) => x !== 'engine' && x !== 'transmission')) as CatalogPartCategory;
    const attributes: PlanPart['attributes'] = {};
    let fitSpecId: string | null = null;
    if (category === 'oil-pan') {
      const pan = pick(c.oilPans!);
      Object.assign(attributes, fitSpecAttributes('oil-pans', pan));
      fitSpecId = pan.id;
    } else if (category === 'oil-pickup') {
      Object.assign(attributes, { sumpPosition: pick(['front', 'rear', 'center']), pickupMount: pick(['pump-bolted', 'block-bolted']), pumpInlet: pick(['CV-19', 'HX-21']) });
    } else if (category === 'oil-pump') {
      attributes.pumpInlet = pick(['CV-19', 'HX-21']);
    } else if (category === 'mount-adapter') {
      const adapter = pick(c.mountAdapters!);
      Object.assign(attributes, fitSpecAttributes('mount-adapters', adapter));
      fitSpecId = adapter.id;
    } else if (category === 'fuel-pump') {
      Object.assign(attributes, { flowLph: 100 + Math.floor(random() * 200), pressurePsi: 40 + Math.floor(random() * 40) });
    } else if (category === 'fuel-regulator') {
      attributes.pressurePsi = pick([43, 58, 65]);
    } else if (category === 'throttle-pedal') {
      attributes.type = pick(['cable', 'electronic']);
    } else if (category === 'radiator') {
      Object.assign(attributes, { inletSide: pick(['left', 'right']), outletSide: pick(['left', 'right']), ratedKw: 200 + Math.floor(random() * 200) });
    } else if (category === 'dipstick') {
      attributes.location = pick(['block-left', 'pan-left']);
    }
    const part: PlanPart = {
      id: `g${i}`,
      sku: `G-${i}`,
      description: `Generated ${category} ${i}`,
      category,
      priceCents: 1000 + Math.floor(random() * 60000),
      laborHours: Math.floor(random() * 40) / 10,
      attributes,
      requires: [],
      excludes: [],
      replaces: [],
      available: Math.floor(random() * 4),
      fitSpecId,
    };
    if (i > 10 && random() < 0.02) part.requires.push(`G-${i - 1 - Math.floor(random() * 10)}`);
    if (i > 10 && random() < 0.02) part.excludes.push(`G-${i - 1 - Math.floor(random() * 10)}`);
    parts.push(part);
  }
  return parts;
}

async function main(): Promise<void> {
  const highs = await highsLoader();
  const solve: MipSolve = (lp, options) => highs.solve(lp, options) as ReturnType<MipSolve>;
  const spec = DEMO_FIT_SPEC;
  const input: PlanInput = {
    engine: {
      name: spec.engine.name,
      railPattern: spec.engine.panRail.pattern,
      bellPattern: spec.engine.bellPattern,
      crankSignal: spec.engine.crankSignal,
      camSignal: spec.engine.camSignal,
      throttle: spec.engine.throttle,
      cylinders: spec.engine.cylinders,
      dipstickLocation: spec.engine.dipstickLocation,
    },
    fitted: {
      'oil-pan': { name: spec.oilPan!.name, attributes: fitSpecAttributes('oil-pans', spec.oilPan), fitSpecId: spec.oilPan!.id },
      'oil-pickup': { name: spec.oilPickup!.name, attributes: fitSpecAttributes('oil-pickups', spec.oilPickup), fitSpecId: spec.oilPickup!.id },
      'oil-pump': { name: spec.oilPump!.name, attributes: fitSpecAttributes('oil-pumps', spec.oilPump), fitSpecId: spec.oilPump!.id },
    },
    shortfalls: runFitCheck(spec).shortfalls,
    parts: generatedCatalog(10_000),
    laborRateCents: 13_500,
    objective: 'lowest-cost',
  };
  const runs = 21;
  const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];
  // Warm up as a running server is: the solver loaded and the planner's code compiled.
  for (const objective of ['lowest-cost', 'least-fabrication', 'in-stock'] as const) for (let k = 0; k < 3; k += 1) await planParts({ ...input, objective }, solve);
  for (const objective of ['lowest-cost', 'least-fabrication', 'in-stock'] as const) {
    const times: number[] = [];
    const cpu: number[] = [];
    let last = await planParts({ ...input, objective }, solve);
    for (let run = 0; run < runs; run += 1) {
      const started = performance.now();
      const usage = process.cpuUsage();
      last = await planParts({ ...input, objective }, solve);
      const used = process.cpuUsage(usage);
      times.push(performance.now() - started);
      cpu.push((used.user + used.system) / 1000);
    }
    times.sort((a, b) => a - b);
    console.log(
      `plan, 10,000 parts, ${objective}: median ${median(times).toFixed(1)} ms, min ${times[0].toFixed(1)} ms, max ${times[runs - 1].toFixed(1)} ms, ` +
        `CPU median ${median(cpu).toFixed(1)} ms (${last.model.columns} columns, ${last.model.rows} rows, ${last.picks.length} picks, status ${last.status}, total ${last.totals.totalCents} cents)`,
    );
  }
  const load = os.loadavg()[0];
  console.log(`load average ${load.toFixed(1)} on ${os.cpus().length} cores: wall-clock figures grow with the machine's load, CPU time much less.`);
}

void main();
