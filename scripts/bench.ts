/**
 * Engine bench: `npm run bench` (human-readable) or `npm run bench -- --json` (one JSON object).
 *   memberDesignMedianMs  median time of one member design from a validated document
 *   sweep1600Ms           a 40 x 40 sweep of length x tip depth (tapered W), total time (median of 5 sweeps)
 *   fullDesignMedianMs    median time of one design with its connection (whatever checkConnection is now)
 *   sweep3600Ms           the reach study's 60 x 60 sweep of length x tip depth on the demo east deck, every
 *                         point a full design with its connection, one thread (median of 5 after 2 warm-ups)
 *   lightestSectionMs     the lightest-sections ranking of every W, HSS, pipe and C shape at one length
 *                         (the demo east deck as a prismatic W at 12 ft; median of 7 after 3 warm-ups)
 * Without station arrays (the desk asks for those only when it draws).
 */
import { parsedDesignSchema, parsedQuantity, type ParsedDesign } from '../shared/schemas/parsed-design';
import { evaluateDesign } from '../shared/engine/design';
import { exampleDesign, exampleMemberOnly } from '../shared/engine/examples';
import { findShape } from '../shared/engine/shapes/table';
import { rankSections } from '../shared/study/lightest-sections';
import { cellOrder, planStudy, runCells, type StudyPlan } from '../shared/study/study-plan';
import { EAST_DECK_DESIGN } from '../server/db/demo-designs';

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

function timeMedian(input: ParsedDesign, runs: number): number {
  for (let i = 0; i < 200; i++) evaluateDesign(input); // warm up the JIT
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    evaluateDesign(input);
    times.push(performance.now() - t0);
  }
  return median(times);
}

function sweepInputs(base: ParsedDesign): ParsedDesign[] {
  const inputs: ParsedDesign[] = [];
  for (let i = 0; i < 40; i++) {
    const length = parsedQuantity(`${(5 + (i * 10) / 39).toFixed(3)} ft`, 'length');
    for (let j = 0; j < 40; j++) {
      const tipDepth = parsedQuantity(`${(4 + (j * 7.5) / 39).toFixed(3)} in`, 'length'); // W12X26 is 12.2 in deep at the root
      const loads = { ...base.loads, point: base.loads.point.map((p) => ({ ...p, at: length })) }; // the guard stays at the tip
      inputs.push({
        ...base,
        loads,
        member: { ...base.member, length, unbracedLength: undefined, section: { shape: 'W12X26', tipDepth } },
      });
    }
  }
  return inputs;
}

/** Median of several timed sweeps: one sweep is short enough for a load spike to swamp it. */
function sweepMedian(inputs: readonly ParsedDesign[], repeats: number): number {
  const times: number[] = [];
  for (let k = 0; k < repeats; k++) {
    const t0 = performance.now();
    for (const input of inputs) evaluateDesign(input);
    times.push(performance.now() - t0);
  }
  return median(times);
}

/** The demo east deck's study: length 4-16 ft x tip depth 3-12 in, 60 x 60. */
function studyPlan(): StudyPlan {
  const planned = planStudy(EAST_DECK_DESIGN, {
    x: { key: 'length', from: 4, to: 16, steps: 60 },
    y: { key: 'tipDepth', from: 3, to: 12, steps: 60 },
  });
  if (!planned.ok) throw new Error(planned.issues.map((i) => `${i.path}: ${i.message}`).join('\n'));
  return planned.plan;
}

function timeRepeats(run: () => void, repeats: number): number {
  const times: number[] = [];
  for (let k = 0; k < repeats; k++) {
    const t0 = performance.now();
    run();
    times.push(performance.now() - t0);
  }
  return median(times);
}

function main(): void {
  const json = process.argv.includes('--json');
  const member = parsedDesignSchema.parse(exampleMemberOnly);
  const full = parsedDesignSchema.parse(exampleDesign);
  const memberDesignMedianMs = timeMedian(member, 3000);
  const inputs = sweepInputs(member);
  sweepMedian(inputs, 1); // warm-up pass
  const sweep1600Ms = sweepMedian(inputs, 5);
  const fullDesignMedianMs = timeMedian(full, 3000);
  const plan = studyPlan();
  const order = cellOrder(60, 60);
  // Warm-up: lets the JIT settle, as in a worker that has run before.
  for (let k = 0; k < 2; k++) runCells(plan, order, findShape);
  const sweep3600Ms = timeRepeats(() => runCells(plan, order, findShape), 5);
  const at12 = parsedDesignSchema.parse({
    ...EAST_DECK_DESIGN,
    member: { ...EAST_DECK_DESIGN.member, length: '12 ft', section: { shape: 'W12X26' } },
    loads: { ...EAST_DECK_DESIGN.loads, point: [{ case: 'D', value: '150 lbf', at: '12 ft' }] },
  });
  for (let k = 0; k < 3; k++) rankSections(at12);
  const lightestSectionMs = timeRepeats(() => rankSections(at12), 7);
  const out = { memberDesignMedianMs, sweep1600Ms, fullDesignMedianMs, sweep3600Ms, lightestSectionMs };
  if (json) {
    console.log(JSON.stringify(out));
    return;
  }
  console.log(`member design, median of 3000: ${memberDesignMedianMs.toFixed(4)} ms (target < 0.2 ms)`);
  console.log(
    `40 x 40 sweep of length x tip depth, median of 5: ${sweep1600Ms.toFixed(1)} ms (target < 500 ms)`,
  );
  console.log(
    `full design with connection, median of 3000: ${fullDesignMedianMs.toFixed(4)} ms (target < 0.3 ms)`,
  );
  console.log(
    `reach study 60 x 60 full designs, one thread, median of 5: ${sweep3600Ms.toFixed(1)} ms (target < 250 ms)`,
  );
  console.log(
    `lightest sections, all W, HSS, pipe and C shapes, median of 7: ${lightestSectionMs.toFixed(1)} ms (target < 100 ms)`,
  );
}

main();
