/** The text sections of the package: cover, caution, inputs, loads, checks, schedule, notes. */
import { documentLeaves } from '../../../shared/schemas/document-leaves';
import { plateScheduleHeaders } from '../../../shared/engine/connection/plate-schedule';
import { CAUTION } from '../../../shared/engine/types';
import { formatQuantity, type Quantity } from '../../../shared/engine/units';
import { capitalised, checkWord, verdictOf } from '../../../shared/words/check-words';
import { pathWords, valueWords } from '../../../shared/words/field-words';
import { displayCheck } from '../../../shared/words/check-display';
import { checkEquation, checkNumbers } from './check-equations';
import { revisionLabel, stampText, type PackageData } from './package-data';
import { CONTENT_WIDTH, MUTED, PAGE, RULE, type PdfWriter } from './pdf-writer';

const q = (v: Quantity | undefined | null) => (v ? formatQuantity(v, 4) : '');

/** The design's verdict word and sentence, as the desk writes them. */
function summary(d: PackageData): string {
  const v = verdictOf(d.result.checks, d.result.ok);
  return `${v.word}. ${v.sentence}`;
}

export function drawCover(w: PdfWriter, d: PackageData): void {
  const r = d.revision;
  w.text('Reachline', { size: 11, color: MUTED }, PAGE.left, PAGE.top + 10);
  w.text('Calculation package', { size: 24, bold: true }, PAGE.left);
  w.text(`${d.cantileverName}: steel cantilever, base plate, anchor rods and pier`, { size: 12 }, PAGE.left);
  w.doc.moveDown(1);
  w.table(
    [
      ['Product', 'Reachline (design aid for steel cantilever decks)'],
      ['Project', d.projectName],
      ['Site', d.site || 'not given'],
      ['Code basis', d.codeBasis || 'not given'],
      ['Cantilever', `${d.cantileverName} (quantity ${d.quantity})`],
      ['Revision', `${revisionLabel(d)}${r.message ? `: ${r.message}` : ''}`],
      ['Author', r.author],
      [
        'Saved',
        r.createdAt
          .replace('T', ' ')
          .replace(/\.\d+Z$/, ' UTC')
          .replace(/Z$/, ' UTC'),
      ],
      ['Review state', r.reviewState],
      [
        'Approved by',
        r.approvedBy ? `${r.approvedBy} on ${(r.approvedAt ?? '').slice(0, 10)}` : 'not approved',
      ],
      ['Design method', `${d.input.method}, results in ${d.input.units} units`],
      ['Engine version', d.engineVersion],
      ['Summary', summary(d)],
      ['Status of this document', stampText(d)],
    ],
    [170, CONTENT_WIDTH - 170],
  );
  w.doc.moveDown(0.4);
  w.para('SHA-256 of the stored input document', { size: 9, bold: true });
  w.para(d.inputSha256, { size: 8.5, mono: true });
  w.para('SHA-256 of the stored result document', { size: 9, bold: true });
  w.para(d.resultSha256, { size: 8.5, mono: true });
  w.para(
    'The SHA-256 values identify the stored documents this package was printed from: the same revision always gives the same package, byte for byte.',
    { size: 8.5, color: MUTED },
  );
}

export function drawCaution(w: PdfWriter): void {
  w.heading('Caution');
  w.para(CAUTION, { size: 11, bold: true });
  w.para(
    'This package reports what the Reachline engine computed for the stored design. It does not replace the judgement, the checking or the seal of a licensed engineer, who is responsible for the final design, the detailing and the calculations submitted under the codes adopted where the deck is built. A check that could not be computed is reported as not computed and never as a pass.',
  );
}

export function drawInputs(w: PdfWriter, d: PackageData): void {
  w.heading('Inputs');
  w.para('Every input of the stored design document, as saved (each quantity with its unit).', {
    size: 9,
    color: MUTED,
  });
  const rows = documentLeaves(d.input);
  const order = ['Settings', 'Reach', 'Section', 'Loads', 'Limits', 'Support'];
  const words = rows.map(([path, v]) => ({ path, label: pathWords(path), value: valueWords(v) }));
  const group = (label: string) => label.split(':')[0];
  words.sort((a, b) => {
    const ga = order.indexOf(group(a.label));
    const gb = order.indexOf(group(b.label));
    return (ga < 0 ? 99 : ga) - (gb < 0 ? 99 : gb);
  });
  w.table(
    [['Input', 'Field', 'Value'], ...words.map((x) => [x.label, x.path, x.value])],
    [220, 170, CONTENT_WIDTH - 390],
    { header: true },
  );
}

export function drawLoads(w: PdfWriter, d: PackageData): void {
  const m = d.result.member;
  w.heading('Loads by case and the combinations used');
  w.para(
    `Self-weight at the root ${q(m.selfWeight)}; steel weight of one member ${q(m.steelWeight)}; section ${m.section.label}, depth ${q(m.section.rootDepth)} at the root and ${q(m.section.tipDepth)} at the tip.`,
    { size: 9 },
  );
  const cases = Object.entries(m.cases);
  w.heading('Unfactored load cases at the root', 2);
  w.table(
    [
      ['Case', 'Root moment', 'Root shear', 'Tip deflection'],
      ...cases.map(([c, e]) => [c, q(e?.rootMoment), q(e?.rootShear), q(e?.tipDeflection)]),
    ],
    [120, 128, 128, 128],
    { header: true },
  );
  w.heading(`${d.result.method} combinations`, 2);
  w.table(
    [
      ['Combination', 'Root moment', 'Root shear', 'Tip deflection'],
      ...m.combinations.map((c) => [c.name, q(c.rootMoment), q(c.rootShear), q(c.tipDeflection)]),
    ],
    [168, 112, 112, 112],
    { header: true },
  );
  w.para(`First natural frequency ${q(m.frequency)}.`, { size: 9 });
}

export function drawChecks(w: PdfWriter, d: PackageData): void {
  w.heading('Checks');
  w.para(summary(d), { bold: true });
  for (const c of d.result.checks) {
    const verdict = capitalised(checkWord(c));
    const equation = `Equation: ${checkEquation(c, d.result.method)}`;
    const numbers = `Numbers: ${checkNumbers(c)}`;
    // Bearing under a large moment reads as a stress (the moments stay in the note).
    const shown = displayCheck(c, d.result.connection);
    const note = shown.note ? `Note: ${shown.note}` : '';
    const h = 130 + [equation, numbers, note].reduce((sum, t) => sum + (t ? w.height(t, { size: 9 }) : 0), 0);
    w.ensure(h);
    w.doc.moveDown(0.4);
    const y = w.doc.y;
    w.doc.rect(PAGE.left, y, CONTENT_WIDTH, 16).fillColor('#f3f4f6').fill();
    w.text(`${c.title}  (${c.id})`, { bold: true, size: 10 }, PAGE.left + 4, y + 3);
    w.doc.y = y + 19;
    w.table(
      [
        [`Clause: ${c.reference}`],
        [`Combination: ${c.combination ?? 'none'}${c.at ? `; governs at x = ${q(c.at)}` : ''}`],
      ],
      [CONTENT_WIDTH],
    );
    w.doc.moveDown(-0.4);
    w.table([[equation], [numbers]], [CONTENT_WIDTH]);
    w.doc.moveDown(-0.4);
    w.table(
      [
        ['Demand', 'Capacity', 'Ratio', 'Verdict'],
        [
          q(shown.demand) || 'not computed',
          q(shown.capacity) || 'not computed',
          c.ratio === null ? 'not computed' : c.ratio.toFixed(2),
          verdict,
        ],
      ],
      [CONTENT_WIDTH * 0.3, CONTENT_WIDTH * 0.3, CONTENT_WIDTH * 0.15, CONTENT_WIDTH * 0.25],
      { header: true },
    );
    if (note) {
      w.doc.moveDown(-0.4);
      w.table([[note]], [CONTENT_WIDTH]);
    }
  }
}

export function drawSchedule(w: PdfWriter, d: PackageData): void {
  w.heading('Plate schedule row');
  const row = d.scheduleRow;
  if (!row) {
    w.para('This design has no connection, so there is no plate to schedule.');
    return;
  }
  const headers = plateScheduleHeaders();
  w.table(
    [
      ['Column', 'Value'],
      ['Quantity (beams)', String(d.quantity)],
      ...headers.map(([key, label]) => [label, row[key]]),
    ],
    [200, CONTENT_WIDTH - 200],
    { header: true },
  );
}

const LIMITS = [
  'The member is analysed as a cantilever fixed at its support face, linear elastic, loads acting downward unless the design gives wind or seismic uplift; shear and moment are reported as magnitudes.',
  'Load combinations are those of ASCE 7-16 2.3.1 (strength) and 2.4.1 (allowable) whose cases are present; deflection uses the service combinations whatever the method, with the span of a cantilever taken as twice its length (IBC Table 1604.3).',
  'Flexure is checked over each unbraced segment of the compression flange: the segment ending at a free tip takes Cb = 1.0, segments between the root and a brace take Cb from AISC 360-16 Eq. F1-1; tapered members are checked station by station with the local section (simplified from AISC Design Guide 25).',
  'Anchor rods: cast-in headed F1554 rods with heavy hex nuts only; no post-installed anchors, hooked rods, shear lugs or designed anchor reinforcement. For ASD the ACI 318 capacities are divided by 1.6.',
  'Moment about one axis (along N) only; the plate and the pier are centred; rod sizes are US inch sizes.',
  'The vibration check compares the first bending frequency with 5 Hz (EN 1990 Annex A2, A2.4.3.2) unless the design states frequencyMin; occupants add mass and lower the frequency a little.',
  'Only the checks listed in this package were computed. Anything not listed (the supporting structure, the pier reinforcement, welds unless listed) was not checked by Reachline.',
];

export function drawNotes(w: PdfWriter, d: PackageData): void {
  w.heading('Notes and limits of the method');
  const notes = d.result.checks.filter((c) => c.note);
  if (notes.length) {
    w.heading('Notes from the checks', 2);
    for (const c of notes) w.para(`${c.id}: ${c.note}`, { size: 9 });
  }
  w.heading('Limits', 2);
  for (const line of LIMITS) w.para(`- ${line}`, { size: 9 });
  w.para(
    'The method in full: shared/engine/METHOD.md and shared/engine/connection/METHOD.md in the Reachline sources.',
    { size: 8.5, color: MUTED },
  );
  const y = w.doc.y + 4;
  w.doc
    .moveTo(PAGE.left, y)
    .lineTo(PAGE.left + CONTENT_WIDTH, y)
    .lineWidth(0.4)
    .strokeColor(RULE)
    .stroke();
}
