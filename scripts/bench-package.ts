/**
 * npm run bench:package: the calculation package of the demo's east deck design, generated 20
 * times (after one warm-up). Prints one JSON object: pages, median and range of the generation
 * time in ms (PDF building only; the engine's result is computed once beforehand), and bytes.
 */
import { EAST_DECK_DESIGN } from '../server/db/demo-designs';
import { packageFromDocument } from '../server/features/package/package-from-file';
import { buildPackagePdf } from '../server/features/package/package-pdf';
import { designSchema } from '../shared/schemas/design';

const RUNS = 20;
const text = JSON.stringify(EAST_DECK_DESIGN);
const data = packageFromDocument(designSchema.parse(EAST_DECK_DESIGN), {
  name: 'East deck (demo)',
  text,
  modified: new Date('2026-12-01T09:00:00Z'),
});

const first = await buildPackagePdf(data);
const times: number[] = [];
let bytes = first.length;
for (let i = 0; i < RUNS; i++) {
  const t0 = performance.now();
  const pdf = await buildPackagePdf(data);
  times.push(performance.now() - t0);
  bytes = pdf.length;
  if (!pdf.equals(first)) throw new Error('the package bytes changed between two runs of the same design');
}
times.sort((a, b) => a - b);
const median = (times[RUNS / 2 - 1] + times[RUNS / 2]) / 2;
// pdfkit writes every page object uncompressed: count them.
const pages = (first.toString('latin1').match(/\/Type \/Page\b(?!s)/g) ?? []).length;
console.log(
  JSON.stringify({
    design: 'East deck (demo), preliminary',
    pages,
    runs: RUNS,
    medianMs: Number(median.toFixed(1)),
    minMs: Number(times[0].toFixed(1)),
    maxMs: Number(times[RUNS - 1].toFixed(1)),
    bytes,
    identicalBytes: true,
  }),
);
