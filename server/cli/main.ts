/**
 * The `reachline` command line (bin.js runs it through tsx). Commands: check, lightest, report, shapes, admin, db backup, --help.
 * Returns the exit code: 0 all checks pass, 1 a check fails, 2 invalid input or usage.
 */
import { adminCreateCommand } from './admin-command';
import { parseArgs } from './args';
import { checkCommand, type CliIo } from './check-command';
import { lightestCommand } from './lightest-command';
import { reportCommand } from './report-command';
import { dbBackupCommand } from './db-backup-command';
import { shapesCommand } from './shapes-command';

export const HELP = `reachline: check a steel cantilever deck design from the command line

Usage:
  reachline check <design.json | ->  [--stations]
  reachline lightest <design.json | ->  [--families W,HSS,PIPE,C]
  reachline report <design.json | -> -o <out.pdf>
  reachline shapes [--json] [--family W|HSS|PIPE|C]
  reachline admin create --email <e-mail> [--name <display name>]  < password
  reachline db backup <file>
  reachline --help

Commands:
  check <file>     Validate a design document (JSON, see the engine contract) and print the
                   result document as JSON on standard output. Use - to read standard input.
                   Standard error lists each combination with its direction ("down": gravity,
                   bottom flange in compression; "up": net uplift from wind (case W, negative)
                   or ASCE 7-16 12.4.4, top flange in compression) and the failing checks.
                   Version 2 keys: loads.seismic, member.lateralSupport, connection.post,
                   connection.weld, connection.flexibleRoot (default true with a connection).
  lightest <file>  Put every shape of the families into the design (same length, loads and
                   connection), run each as a full design and print JSON: "passing" ordered
                   by steel weight, lightest first, each with its governing check and ratio,
                   then "failing" with the check that fails. For a tapered W design each W
                   gets the shallowest tip depth that passes ("tipDepth", absent when only
                   the full depth passes). Exit 0 when at
                   least one shape passes, 1 when none does, 2 for invalid input.
  report <file>    Run the engine on a design document and write a preliminary calculation
                   package (PDF: inputs, loads, diagrams, every check, the plate sketch and the
                   schedule row), stamped PRELIMINARY, NOT FOR CONSTRUCTION on every page.
  shapes           List the shapes table shipped with Reachline and its source.
  admin create     Create an admin account in the configured database (DATABASE_URL); the
                   password is read from standard input (one line) and must be hard to guess.
  db backup <file> Write a consistent copy of the configured database to a new file while the
                   app runs: SQLite through its backup API, PostgreSQL through pg_dump (custom
                   format, restore with pg_restore).

Options:
  --stations       (check) also print the station arrays: x, shear, moment, deflection and depth
                   along the member, per load case and per combination, in the result's units.
  --families <list>  (lightest) families to try, comma-separated; default W,HSS,PIPE,C.
  -o, --output <f> (report) where to write the PDF.
  --json           (shapes) print the whole table as one JSON object: the source and every shape
                   with its properties under the published database's column names.
  --family <name>  (shapes) only one family: W, HSS, PIPE or C.
  -h, --help       Show this help.

Exit status:
  0  every check passes
  1  at least one check does not pass (the result is still printed)
  2  the input is invalid or the command is misused: one line per problem on standard error,
     "field.path: what is wrong", and nothing on standard output

The caution is printed on standard error after every successful run: Reachline is a design aid;
final design, detailing and sealed calculations are by a licensed engineer.
`;

// A reader that stops early (`reachline shapes | head`) closes the pipe: that is not an error.
process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code !== 'EPIPE') throw e;
});

const processIo: CliIo = {
  out: (text) => void process.stdout.write(text),
  err: (text) => void process.stderr.write(text),
  readStdin: async () => {
    const chunks: Buffer[] = [];
    for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
    return Buffer.concat(chunks).toString('utf8');
  },
};

export async function main(args: string[], io: CliIo = processIo): Promise<number> {
  const [command, ...rest] = args;
  if (!command || command === '--help' || command === '-h' || command === 'help') {
    io.out(HELP);
    return command ? 0 : 2;
  }
  if (command === 'check') {
    const a = parseArgs(rest, ['--stations', '--help', '-h']);
    if (a.flags.has('--help') || a.flags.has('-h')) return usage(io, null, 0);
    if (a.unknown.length) return usage(io, `unknown option ${a.unknown.join(', ')}`);
    if (a.positionals.length !== 1) return usage(io, 'check needs one design file (or - for standard input)');
    return checkCommand(a.positionals[0], a.flags.has('--stations'), io);
  }
  if (command === 'lightest') {
    const a = parseArgs(rest, ['--help', '-h'], ['--families']);
    if (a.flags.has('--help') || a.flags.has('-h')) return usage(io, null, 0);
    if (a.unknown.length) return usage(io, `unknown option ${a.unknown.join(', ')}`);
    if (a.positionals.length !== 1)
      return usage(io, 'lightest needs one design file (or - for standard input)');
    return lightestCommand(a.positionals[0], a.values.get('--families'), io);
  }
  if (command === 'report') {
    const a = parseArgs(rest, ['--help', '-h'], ['-o', '--output']);
    if (a.flags.has('--help') || a.flags.has('-h')) return usage(io, null, 0);
    if (a.unknown.length) return usage(io, `unknown option ${a.unknown.join(', ')}`);
    const out = a.values.get('-o') ?? a.values.get('--output');
    if (a.positionals.length !== 1 || !out)
      return usage(io, 'report needs one design file (or - for standard input) and -o <out.pdf>');
    return reportCommand(a.positionals[0], out, io);
  }
  if (command === 'shapes') {
    const a = parseArgs(rest, ['--json', '--help', '-h'], ['--family']);
    if (a.flags.has('--help') || a.flags.has('-h')) return usage(io, null, 0);
    if (a.unknown.length || a.positionals.length)
      return usage(io, `unexpected ${[...a.unknown, ...a.positionals].join(', ')}`);
    return shapesCommand(a.flags.has('--json'), a.values.get('--family'), io);
  }
  if (command === 'admin') {
    const [sub, ...more] = rest;
    const a = parseArgs(more, ['--help', '-h'], ['--email', '--name']);
    if (a.flags.has('--help') || a.flags.has('-h')) return usage(io, null, 0);
    if (sub !== 'create') return usage(io, 'admin needs the subcommand create');
    if (a.unknown.length || a.positionals.length)
      return usage(io, `unexpected ${[...a.unknown, ...a.positionals].join(', ')}`);
    return adminCreateCommand(a.values.get('--email'), a.values.get('--name'), io);
  }
  if (command === 'db') {
    const [sub, ...more] = rest;
    const a = parseArgs(more, ['--help', '-h']);
    if (a.flags.has('--help') || a.flags.has('-h')) return usage(io, null, 0);
    if (sub !== 'backup') return usage(io, 'db needs the subcommand backup');
    if (a.unknown.length) return usage(io, `unknown option ${a.unknown.join(', ')}`);
    if (a.positionals.length !== 1) return usage(io, 'db backup needs one file to write');
    return dbBackupCommand(a.positionals[0], io);
  }
  return usage(io, `unknown command "${command}"`);
}

function usage(io: CliIo, problem: string | null, code = 2): number {
  if (problem) {
    io.err(`${problem}\n\n${HELP}`);
    return code;
  }
  io.out(HELP);
  return code;
}
