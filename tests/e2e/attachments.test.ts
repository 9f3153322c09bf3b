/**
 * Attachments in a real browser: upload a drawing to the desk, see it listed, download the same
 * bytes; a disguised file and a PNG named .pdf are refused; a description and a revision go with an
 * upload and show in the list; the uploader deletes a file after a confirmation.
 */
import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { startE2E, type E2E, shown } from '../helpers/e2e';

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
  await shown(page.getByRole('region', { name: 'Attachments' }));
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
    await shown(files.getByRole('status').filter({ hasText: 'Uploaded “pier-detail.png”' }));
    const sha = createHash('sha256').update(PNG).digest('hex');
    await shown(files.getByText(`sha256 ${sha.slice(0, 10)}`));
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
    await shown(alert);
    expect(await alert.textContent()).toContain('This file is not allowed.');
    expect(await files.getByText('photo.png').count()).toBe(0);
  });

  it('refuses a PNG named .pdf, saying what the content is and listing the accepted types once', async () => {
    const files = page.getByRole('region', { name: 'Attachments' });
    await files
      .getByLabel(/Add a file/)
      .setInputFiles({ name: 'really-a-png.pdf', mimeType: 'application/pdf', buffer: PNG });
    await files.getByRole('button', { name: 'Upload' }).click();
    const alert = files.getByRole('alert');
    await expect
      .poll(() => alert.textContent())
      .toContain('its content is a PNG image but its name has .pdf');
    const text = (await alert.textContent()) ?? '';
    expect(text.match(/PDF, PNG, JPEG, DXF or CSV/g)).toHaveLength(1);
    expect(await files.getByText('really-a-png.pdf').count()).toBe(0);
  });

  it('uploads with a description and a revision, shows both, and deletes the file after a confirmation', async () => {
    const files = page.getByRole('region', { name: 'Attachments' });
    await files
      .getByLabel(/Add a file/)
      .setInputFiles({ name: 'pier-elevation.png', mimeType: 'image/png', buffer: PNG });
    await files.getByLabel('Description (optional)').fill('Pier elevation with the anchor rods');
    const revisionChoice = files.getByLabel('Belongs to');
    await revisionChoice.locator('option', { hasText: 'revision 1' }).first().waitFor({ state: 'attached' });
    await revisionChoice.selectOption({ index: 1 }); // the newest revision (0 is "no particular revision")
    await files.getByRole('button', { name: 'Upload' }).click();
    await shown(files.getByRole('status').filter({ hasText: 'Uploaded “pier-elevation.png”' }));
    const item = files.getByRole('listitem').filter({ hasText: 'pier-elevation.png' });
    await shown(item.getByText('Pier elevation with the anchor rods'));
    await shown(item.getByText(/^revision \d+$/));
    await e2e.screenshot(page, 'desk-attachment-details');
    const href = await item.getByRole('link', { name: 'Download pier-elevation.png' }).getAttribute('href');

    await item.getByRole('button', { name: 'Delete pier-elevation.png' }).click();
    const dialog = page.getByRole('dialog', { name: 'Delete this file?' });
    await dialog.getByRole('button', { name: 'Keep the file' }).click();
    expect(await files.getByText('pier-elevation.png').count()).toBeGreaterThan(0);
    await item.getByRole('button', { name: 'Delete pier-elevation.png' }).click();
    await dialog.getByRole('button', { name: 'Delete the file' }).click();
    await shown(files.getByText('Deleted “pier-elevation.png”.'));
    await expect
      .poll(() => files.getByRole('listitem').filter({ hasText: 'pier-elevation.png' }).count())
      .toBe(0);
    const status = await page.evaluate(async (h) => (await fetch(h)).status, href as string);
    expect(status).toBe(404);
  });
});
