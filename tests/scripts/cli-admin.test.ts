/** `reachline admin create` and a UTF-8 byte-order mark in a design file. */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { adminCreateCommand } from '../../server/cli/admin-command';
import type { CliIo } from '../../server/cli/check-command';
import { main } from '../../server/cli/main';
import { createDb } from '../../server/db/knex';
import { verifyPassword } from '../../server/lib/password';
import { exampleMemberOnly } from '../../shared/engine/examples';

const dir = mkdtempSync(join(tmpdir(), 'reachline-cli-admin-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function io(stdin: string) {
  const captured = { out: '', err: '' };
  const cli: CliIo = {
    out: (t) => void (captured.out += t),
    err: (t) => void (captured.err += t),
    readStdin: async () => stdin,
  };
  return { cli, captured };
}

describe('reachline admin create', () => {
  const env = { DATABASE_URL: join(dir, 'admin.sqlite'), NODE_ENV: 'production' };

  it('creates an admin with the password from standard input', async () => {
    const { cli, captured } = io('\uFEFFslate quarry beneath 12 oaks\n');
    expect(await adminCreateCommand('Boss@Example.test', 'The Boss', cli, env)).toBe(0);
    expect(captured.out).toMatch(/Created the admin account boss@example\.test/);
    const db = createDb(env.DATABASE_URL);
    try {
      const row = await db('users').where({ email: 'boss@example.test' }).first();
      expect(row).toMatchObject({ role: 'admin', display_name: 'The Boss' });
      expect(Boolean(row.must_change_password)).toBe(true);
      expect(await verifyPassword('slate quarry beneath 12 oaks', row.password_hash)).toBe(true);
      // One welcome mail, to the new address, with the sign-in address and no password.
      const mails = await db('outbox');
      expect(mails).toHaveLength(1);
      expect(JSON.parse(mails[0].to_json)).toEqual(['boss@example.test']);
      expect(mails[0].text).toContain('/sign-in with the e-mail address boss@example.test');
      expect(mails[0].text).not.toContain('slate quarry');
    } finally {
      await db.destroy();
    }
  }, 60_000);

  it('refuses a weak password, a taken e-mail and a missing e-mail with exit 2 and the field', async () => {
    const weak = io('1234567890\n');
    expect(await adminCreateCommand('other@example.test', undefined, weak.cli, env)).toBe(2);
    expect(weak.captured.err).toMatch(/^password: is too easy to guess/);
    const taken = io('another long phrase for 7 decks\n');
    expect(await adminCreateCommand('boss@example.test', undefined, taken.cli, env)).toBe(2);
    expect(taken.captured.err).toMatch(/^email: .* exists already/);
    const none = io('whatever\n');
    expect(await main(['admin', 'create'], none.cli)).toBe(2);
    expect(none.captured.err).toMatch(/^email:/);
    const usage = io('');
    expect(await main(['admin', 'delete'], usage.cli)).toBe(2);
  }, 60_000);
});

describe('reachline check with a byte-order mark', () => {
  it('reads a UTF-8 file that starts with a BOM', async () => {
    const file = join(dir, 'bom.json');
    writeFileSync(file, `\uFEFF${JSON.stringify(exampleMemberOnly)}`, 'utf8');
    const { cli, captured } = io('');
    const code = await main(['check', file], cli);
    expect([0, 1]).toContain(code);
    expect(JSON.parse(captured.out).engineVersion).toEqual(expect.any(String));
  });
});
