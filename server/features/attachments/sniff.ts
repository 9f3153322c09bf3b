/**
 * Decides an upload's type from its content, never from its name or the browser's claim.
 * Binary types (PDF, PNG, JPEG) by their signatures (file-type); DXF and CSV are text, so they get
 * a careful structural sniff. The name's extension must agree with the content either way (a PNG
 * called .pdf or a text file called .png is refused), so the kept name never misleads. Reasons
 * name no list of accepted types: the caller adds that once (ACCEPTED_TYPES_TEXT).
 */
import { fileTypeFromBuffer } from 'file-type';

export type SniffResult = { ok: true; mime: string } | { ok: false; reason: string };

/** The accepted types in words, for the one sentence of a refusal that lists them. */
export const ACCEPTED_TYPES_TEXT = 'PDF, PNG, JPEG, DXF or CSV';

/** Each binary type the content may be, with the extensions a name of that type may carry. */
const BINARY_TYPES: ReadonlyMap<string, { words: string; extensions: readonly string[] }> = new Map([
  ['application/pdf', { words: 'a PDF document', extensions: ['pdf'] }],
  ['image/png', { words: 'a PNG image', extensions: ['png'] }],
  ['image/jpeg', { words: 'a JPEG image', extensions: ['jpg', 'jpeg'] }],
]);

export function extension(name: string): string {
  const dot = name.lastIndexOf('.');
  return dot >= 0 ? name.slice(dot + 1).toLowerCase() : '';
}

function decodeUtf8(buffer: Buffer): string | null {
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(buffer);
  } catch {
    return null;
  }
}

/** DXF: group-code / value line pairs, starting with a SECTION and ending with EOF. */
export function looksLikeDxf(text: string): boolean {
  const lines = text
    .replace(/^\uFEFF/, '')
    .split(/\r?\n/)
    .map((l) => l.trim());
  while (lines.length > 0 && lines[lines.length - 1] === '') lines.pop();
  if (lines.length < 4 || lines.length % 2 !== 0) return false;
  let i = 0;
  while (i + 1 < lines.length && lines[i] === '999') i += 2; // leading comments
  if (lines[i] !== '0' || lines[i + 1] !== 'SECTION') return false;
  if (lines[lines.length - 2] !== '0' || lines[lines.length - 1] !== 'EOF') return false;
  const limit = Math.min(lines.length, 4000);
  for (let j = 0; j < limit; j += 2) {
    if (!/^-?\d{1,4}$/.test(lines[j])) return false;
  }
  return true;
}

/** Counts delimiters outside double quotes. */
function countOutsideQuotes(line: string, delimiter: string): number {
  let n = 0;
  let quoted = false;
  for (const ch of line) {
    if (ch === '"') quoted = !quoted;
    else if (ch === delimiter && !quoted) n += 1;
  }
  return n;
}

/** CSV: text with one delimiter used the same number of times on every line, and no markup. */
export function looksLikeCsv(text: string): boolean {
  const lines = text
    .replace(/^\uFEFF/, '')
    .split(/\r?\n/)
    .filter((l) => l.trim() !== '')
    .slice(0, 200);
  if (lines.length === 0) return false;
  if (/^\s*</.test(lines[0]) || /<(script|html|body|svg|iframe)\b/i.test(text)) return false;
  return [',', ';', '\t'].some((d) => {
    const counts = lines.map((l) => countOutsideQuotes(l, d));
    return counts[0] >= 1 && counts.every((c) => c === counts[0]);
  });
}

export async function sniffAttachment(buffer: Buffer, originalName: string): Promise<SniffResult> {
  if (buffer.length === 0) return { ok: false, reason: 'the file is empty' };
  const ext = extension(originalName);
  const named = ext ? `.${ext}` : 'no extension';
  const detected = await fileTypeFromBuffer(buffer);
  if (detected) {
    const known = BINARY_TYPES.get(detected.mime);
    if (!known) return { ok: false, reason: `its content is ${detected.mime}, a type that is not accepted` };
    if (!known.extensions.includes(ext))
      return {
        ok: false,
        reason: `its content is ${known.words} but its name has ${named}; rename it to .${known.extensions[0]}`,
      };
    return { ok: true, mime: detected.mime };
  }
  const text = buffer.includes(0) ? null : decodeUtf8(buffer);
  if (text === null) return { ok: false, reason: 'its content is none of the accepted types' };
  if (ext === 'dxf') {
    return looksLikeDxf(text)
      ? { ok: true, mime: 'image/vnd.dxf' }
      : { ok: false, reason: 'it is named .dxf but its content is not a DXF drawing' };
  }
  if (ext === 'csv') {
    return looksLikeCsv(text)
      ? { ok: true, mime: 'text/csv' }
      : { ok: false, reason: 'it is named .csv but its content is not comma-separated values' };
  }
  return { ok: false, reason: `its content does not match its name (${named})` };
}
