/**
 * The fonts of the calculation package: IBM Plex, the same family the app ships, read from the
 * installed @fontsource packages (WOFF, which pdfkit's font engine reads and subsets). The Latin
 * files lack Greek letters, so text is split into runs and Greek runs use Plex's Greek file.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';

const require = createRequire(import.meta.url);

export const FONT = {
  sans: 'plex-sans',
  sansBold: 'plex-sans-semibold',
  mono: 'plex-mono',
  greek: 'plex-sans-greek',
} as const;

type FontName = (typeof FONT)[keyof typeof FONT];

function fontFile(pkg: string, file: string): string {
  // The packages export only CSS; their index.css sits beside files/.
  return join(dirname(require.resolve(pkg)), 'files', file);
}

const FILES: Record<FontName, [string, string]> = {
  'plex-sans': ['@fontsource/ibm-plex-sans', 'ibm-plex-sans-latin-400-normal.woff'],
  'plex-sans-semibold': ['@fontsource/ibm-plex-sans', 'ibm-plex-sans-latin-600-normal.woff'],
  'plex-mono': ['@fontsource/ibm-plex-mono', 'ibm-plex-mono-latin-400-normal.woff'],
  'plex-sans-greek': ['@fontsource/ibm-plex-sans', 'ibm-plex-sans-greek-400-normal.woff'],
};

let cache: Map<FontName, Buffer> | null = null;

/** The font files as bytes (read once; they never change while the process runs). */
export function fontBuffers(): Map<FontName, Buffer> {
  if (!cache) {
    cache = new Map(
      (Object.entries(FILES) as [FontName, [string, string]][]).map(([name, [pkg, file]]) => [
        name,
        readFileSync(fontFile(pkg, file)),
      ]),
    );
  }
  return cache;
}

const GREEK = /[\u0370-\u03ff]/;
/** Symbols outside both files, written the way a hand calculation would. */
const REPLACE: Record<string, string> = { '≤': '<=', '≥': '>=', '√': 'sqrt', '…': '...', '−': '-' };

export interface Run {
  text: string;
  greek: boolean;
}

/** Splits text into Latin and Greek runs, with the few missing symbols spelled out. */
export function textRuns(text: string): Run[] {
  const clean = text.replace(/[≤≥√…−]/g, (c) => REPLACE[c] ?? c);
  const runs: Run[] = [];
  for (const ch of clean) {
    const greek = GREEK.test(ch);
    const last = runs[runs.length - 1];
    if (last && last.greek === greek) last.text += ch;
    else runs.push({ text: ch, greek });
  }
  return runs;
}
