/** Attachments in a real browser: upload a drawing to the desk, see it listed, download the same bytes; a disguised file is refused. */
import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { startE2E, type E2E } from '../helpers/e2e';

let e2e: E2E;
let page: Page;

// A valid 1 x 1 PNG (signature, IHDR, IDAT, IEND).
const PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==',
  'base64',
);

beforeAll(async () => {
  e2e = await startE2E();
  const session = await e2e.newSession();
  page = session.page;
  await e2e.signInAs(session.context, 'fabricator');
  await page.goto('/cantilevers/1');
  await page.getByRole('region', { name: 'Attachments' }).waitFor();
});

afterAll(async () => {
  await e2e?.close();
});

describe('attachments on the desk', () => {
  it('uploads a PNG, lists it with its checksum, and downloads identical bytes', async () => {
    const files = page.getByRole('region', { name: 'Attachments' });
    await files
      .getByLabel(/Add a file/)
      .setInputFiles({ name: 'pier-detail.png', mimeType: 'image/png', buffer: PNG });
    await files.getByRole('button', { name: 'Upload' }).click();
    await expect.poll(() => files.getByRole('status').textContent()).toContain('Uploaded “pier-detail.png”');
    const sha = createHash('sha256').update(PNG).digest('hex');
    await files.getByText(`sha256 ${sha.slice(0, 10)}`).waitFor();
    const href = await files.getByRole('link', { name: 'Download pier-detail.png' }).getAttribute('href');
    const downloaded = await page.evaluate(async (h) => {
      const bytes = new Uint8Array(await (await fetch(h)).arrayBuffer());
      const digest = new Uint8Array(await crypto.subtle.digest('SHA-256', bytes));
      return Array.from(digest, (b) => b.toString(16).padStart(2, '0')).join('');
    }, href as string);
    expect(downloaded).toBe(sha);
    await e2e.screenshot(page, 'desk-attachments');
  });

  it('refuses a web page renamed .png and says why in words', async () => {
    const files = page.getByRole('region', { name: 'Attachments' });
    const html = Buffer.from('<!doctype html><html><body><script>alert(1)</script></body></html>');
    await files
      .getByLabel(/Add a file/)
      .setInputFiles({ name: 'photo.png', mimeType: 'image/png', buffer: html });
    await files.getByRole('button', { name: 'Upload' }).click();
    const alert = files.getByRole('alert');
    await alert.waitFor();
    expect(await alert.textContent()).toContain('This file is not allowed.');
    expect(await files.getByText('photo.png').count()).toBe(0);
  });
});
