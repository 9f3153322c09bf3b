/**
 * `npm start`'s pieces: the build stamp that lets a second start skip its builds, and the bundled
 * server it runs (built here into its own folder, started on a random port with a temporary database).
 */
import { spawn } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { serverBuildStep } from '../../scripts/lib/server-build';
import { inputsHash, staleReason, writeStamp } from '../../scripts/lib/stamp';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const temp = mkdtempSync(join(tmpdir(), 'reachline-start-'));
// Inside node_modules, so the bundle finds its external dependencies as the real one does.
const bundleDir = join(ROOT, 'node_modules', '.cache', 'reachline', `server-test-${process.pid}`);
afterAll(() => {
  rmSync(temp, { recursive: true, force: true });
  rmSync(bundleDir, { recursive: true, force: true });
});

describe('the build stamp', () => {
  const src = join(temp, 'project');
  const out = join(src, 'out');
  mkdirSync(join(src, 'src'), { recursive: true });
  mkdirSync(out, { recursive: true });
  writeFileSync(join(src, 'src', 'a.ts'), 'export const a = 1;\n');
  writeFileSync(join(src, 'index.html'), '<div id="root"></div>\n');
  const inputs = ['src', 'index.html', 'absent.json'];

  it('is up to date only while every input has the content it had at build time', () => {
    expect(staleReason(out, inputsHash(src, inputs))).toBe('not built yet');
    writeFileSync(join(out, 'app.js'), 'built');
    writeStamp(out, inputsHash(src, inputs));
    expect(staleReason(out, inputsHash(src, inputs))).toBeNull();

    writeFileSync(join(src, 'src', 'a.ts'), 'export const a = 2;\n');
    expect(staleReason(out, inputsHash(src, inputs))).toBe('the sources changed since the last build');
    writeFileSync(join(src, 'src', 'a.ts'), 'export const a = 1;\n');
    expect(staleReason(out, inputsHash(src, inputs))).toBeNull();

    writeFileSync(join(src, 'src', 'b.ts'), '');
    expect(staleReason(out, inputsHash(src, inputs))).toBe('the sources changed since the last build');
    rmSync(join(src, 'src', 'b.ts'));
  });

  it('ignores modification times, and notices a file missing from the build', () => {
    const hash = inputsHash(src, inputs);
    utimesSync(join(src, 'index.html'), new Date(2030, 0, 1), new Date(2030, 0, 1));
    expect(staleReason(out, inputsHash(src, inputs))).toBeNull();
    rmSync(join(out, 'app.js'));
    expect(staleReason(out, hash)).toBe('app.js is missing from the last build');
  });
});

describe('the bundled server', { timeout: 120000 }, () => {
  it('migrates and seeds an empty database, listens, answers, and stops on SIGTERM', async () => {
    const step = serverBuildStep(ROOT, bundleDir);
    expect(step.doing).toBe('not built yet: bundling the server');
    // As npm start runs it: no NODE_ENV (vitest sets one). Vite's build sets NODE_ENV=production
    // when it is unset; the step must put it back, or the server started next skips the demo.
    const nodeEnv = process.env.NODE_ENV;
    delete process.env.NODE_ENV;
    try {
      expect(await step.run()).toBe('done');
      expect(process.env.NODE_ENV).toBeUndefined();
    } finally {
      process.env.NODE_ENV = nodeEnv;
    }
    expect(serverBuildStep(ROOT, bundleDir).doing).toBe('checking the server bundle');

    const data = join(temp, 'data');
    const child = spawn(process.execPath, [join(bundleDir, 'serve.js')], {
      cwd: ROOT,
      env: {
        ...process.env,
        PORT: '0',
        DATABASE_URL: join(data, 'reachline.sqlite'),
        DATA_DIR: data,
        UPLOAD_DIR: join(data, 'uploads'),
      },
    });
    let out = '';
    child.stdout.on('data', (c: Buffer) => void (out += c.toString()));
    child.stderr.on('data', (c: Buffer) => void (out += c.toString()));
    const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
    const url = await new Promise<string>((resolve, reject) => {
      const poll = setInterval(() => {
        const m = /running at (http:\/\/\S+)/.exec(out);
        if (m) resolve(m[1]);
        if (m || child.exitCode !== null) clearInterval(poll);
        if (!m && child.exitCode !== null) reject(new Error(`the server exited:\n${out}`));
      }, 50);
    });
    expect(out).toMatch(
      /^Database: migrating .*reachline\.sqlite… applied \d+ migration\(s\), seeded the demo/m,
    );
    const health = await fetch(`${url}/api/health`);
    expect(health.status).toBe(200);
    child.kill('SIGTERM');
    expect(await exited).toBe(0);
    expect(out).toContain('SIGTERM: shutting down');
  });
});
