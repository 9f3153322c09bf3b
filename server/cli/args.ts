/** A small argument reader for the `reachline` command: positionals and --flags, nothing more. */

export interface ParsedArgs {
  positionals: string[];
  flags: Set<string>;
  /** Flags that take a value (--family W). */
  values: Map<string, string>;
  /** Flags not in the known list: reported as a usage error. */
  unknown: string[];
}

/**
 * @param known flags without a value, e.g. ["--json"]
 * @param withValue flags that take the next argument as value, e.g. ["--family"]
 */
export function parseArgs(
  args: readonly string[],
  known: readonly string[],
  withValue: readonly string[] = [],
): ParsedArgs {
  const out: ParsedArgs = { positionals: [], flags: new Set(), values: new Map(), unknown: [] };
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a === '-' || !a.startsWith('-')) out.positionals.push(a);
    else if (known.includes(a)) out.flags.add(a);
    else if (withValue.includes(a) && i + 1 < args.length) out.values.set(a, args[++i]);
    else out.unknown.push(a);
  }
  return out;
}
