/**
 * The HTTP payload types come from the zod schemas, so renaming a field of a request schema must
 * fail typecheck wherever a handler, service or client reads the old name. This compiles the server
 * and the client's save call with the TypeScript compiler with the save schema's `message` field
 * renamed to `note` in memory (no file is changed).
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../../', import.meta.url));
const apiSchemas = `${root}shared/schemas/api.ts`;
const roots = [
  `${root}server/express.d.ts`,
  // The save route and the service behind it (not the whole app: a smaller program, the same check).
  `${root}server/features/revisions/revisions.router.ts`,
  `${root}src/lib/api/revisions/save-revision.ts`,
];

function compilerOptions(): ts.CompilerOptions {
  const config = ts.readConfigFile(`${root}tsconfig.json`, (p) => ts.sys.readFile(p));
  return ts.parseJsonConfigFileContent(config.config, ts.sys, root).options;
}

function diagnostics(rewrite: (source: string) => string): string[] {
  const options = compilerOptions();
  const host = ts.createCompilerHost(options);
  const readFile = host.readFile.bind(host);
  host.readFile = (path) => (path === apiSchemas ? rewrite(readFileSync(path, 'utf8')) : readFile(path));
  const getSourceFile = host.getSourceFile.bind(host);
  host.getSourceFile = (path, language, onError, create) =>
    path === apiSchemas
      ? ts.createSourceFile(path, host.readFile(path) ?? '', language)
      : getSourceFile(path, language, onError, create);
  const program = ts.createProgram(roots, options, host);
  // Only the service is checked (checking every file of the program took most of this test's time):
  // its diagnostics still need the whole program's types, schema included.
  const missing = roots.filter((file) => !program.getSourceFile(file));
  if (missing.length > 0) throw new Error(`not found: ${missing.join(', ')}`);
  const service = program.getSourceFile(`${root}server/features/revisions/revisions.service.ts`);
  if (!service) throw new Error('the save service is not part of the program');
  const found = [...program.getSyntacticDiagnostics(service), ...program.getSemanticDiagnostics(service)];
  return found.map((d) => {
    const where = d.file ? d.file.fileName.replace(root, '') : '(global)';
    return `${where}: ${ts.flattenDiagnosticMessageText(d.messageText, '\n')}`;
  });
}

function renameSaveMessage(source: string): string {
  const from = "message: z.string().trim().min(1, 'describe what changed')";
  expect(source).toContain(from);
  return source.replace(from, "note: z.string().trim().min(1, 'describe what changed')");
}

describe('typed routes', () => {
  it('a renamed field of the save schema fails typecheck in the service that reads it', () => {
    // The unchanged sources typecheck clean (`npm run typecheck`), so every error here is the rename's.
    const errors = diagnostics(renameSaveMessage);
    const inService = errors.filter((e) => e.startsWith('server/features/revisions/revisions.service.ts'));
    expect(inService.length).toBeGreaterThan(0);
    expect(inService.every((e) => e.includes("'message'"))).toBe(true);
  }, 300_000);
});
