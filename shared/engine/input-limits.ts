/**
 * Checks on the document that the schema cannot make alone: positions beyond the tip, an unbraced
 * length longer than the member, steel properties outside what AISC 360 covers, sizes beyond what
 * the engine was written for. Each problem names its field path.
 */
import type { ParsedDesign } from '../schemas/parsed-design';
import type { FieldProblem } from './sections/resolve-section';

/** Longest cantilever the engine accepts, in (60 ft: far beyond any deck, short of absurd). */
export const MAX_LENGTH = 720;
/** Steepest taper the local-section checks accept: depth change / length (1:4, common practice, no source). */
export const MAX_TAPER_SLOPE = 0.25;

/** Shortest, in (1 ft: below that it is a bracket, not a cantilever beam). */
export const MIN_LENGTH = 12;

export function inputProblems(input: ParsedDesign, L: number, Fy: number, E: number): FieldProblem[] {
  const problems: FieldProblem[] = [];
  const { member, loads } = input;
  if (L > MAX_LENGTH) {
    problems.push({
      path: 'member.length',
      message: `is longer than the 60 ft the engine checks, got "${member.length.text}"`,
    });
  }
  if (L < MIN_LENGTH) {
    problems.push({
      path: 'member.length',
      message: `is shorter than the 1 ft the engine checks, got "${member.length.text}"`,
    });
  }
  loads.point.forEach((p, i) => {
    if (p.at.value > L * (1 + 1e-9)) {
      problems.push({
        path: `loads.point[${i}].at`,
        message: `is beyond the tip (length ${member.length.text}), got "${p.at.text}"`,
      });
    }
  });
  if (member.unbracedLength && member.unbracedLength.value > L * (1 + 1e-9)) {
    problems.push({
      path: 'member.unbracedLength',
      message: `must not exceed the member length (${member.length.text}), got "${member.unbracedLength.text}"`,
    });
  }
  const ls = member.lateralSupport;
  if (ls && member.unbracedLength) {
    problems.push({
      path: 'member.unbracedLength',
      message: 'give the braces in member.lateralSupport.braces instead of unbracedLength, not both',
    });
  }
  (ls?.braces ?? []).forEach((b, i) => {
    if (b.value >= L * (1 - 1e-9)) {
      problems.push({
        path: `member.lateralSupport.braces[${i}]`,
        message: `must lie between the root and the tip (length ${member.length.text}), got "${b.text}"`,
      });
    }
  });
  const conn = input.connection;
  if (conn?.post && conn.arrangement !== 'post-base') {
    problems.push({
      path: 'connection.post',
      message: 'applies to a post base only (arrangement "post-base")',
    });
  } else if (conn?.post && !conn.footprint) {
    problems.push({
      path: 'connection.footprint',
      message:
        'name the post\'s section (e.g. { "shape": "HSS8X8X1/2" }) to check the post of height connection.post.height',
    });
  }
  if (!(Fy >= 20 && Fy <= 100)) {
    problems.push({
      path: 'member.steel.Fy',
      message: `must be between 20 and 100 ksi for a structural steel, got "${member.steel?.Fy?.text}"`,
    });
  }
  if (!(E >= 25000 && E <= 32000)) {
    problems.push({
      path: 'member.steel.E',
      message: `must be about 29000 ksi (200 GPa) for steel, got "${member.steel?.E?.text}"`,
    });
  }
  if (member.spacing.value > 240) {
    problems.push({
      path: 'member.spacing',
      message: `is wider than the 20 ft the engine checks, got "${member.spacing.text}"`,
    });
  }
  return problems;
}
