import { mkdirSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import { startServer } from './server/start';
const dir = mkdtempSync(join(tmpdir(), 'rl-c-')); mkdirSync(join(dir,'uploads'));
const server = await startServer({ port: 0, databaseUrl: join(dir, 'b.sqlite'), uploadDir: join(dir,'uploads'), dataDir: dir });
const context = await chromium.launchPersistentContext(join(dir, 'profile'), { executablePath: '/usr/bin/chromium', args: ['--headless','--no-sandbox','--disable-gpu'], viewport: { width: 1440, height: 960 }, baseURL: server.url });
await context.request.post(`${server.url}/api/auth/login`, { data: { email: 'engineer@reachline.test', password: 'reachline-demo' } });
const page = context.pages()[0];
await page.goto('/cantilevers/1'); await page.getByTestId('tip-deflection').waitFor(); await page.waitForTimeout(500);
await page.evaluate(() => performance.clearMarks());
for (let i = 0; i < 10; i++) { const b = await page.evaluate(() => performance.getEntriesByName('desk-redraw').length); await page.locator('#f-member-length').fill(`${8 + i * 0.5} ft`); await page.waitForFunction((n) => performance.getEntriesByName('desk-redraw').length > n, b); }
await page.waitForTimeout(300);
console.log(await page.evaluate(() => ['dbg-chart-render','dbg-results-render','dbg-editor-render'].map(n => `${n}: ${performance.getEntriesByName(n).length}`)));
await context.close(); await server.close();
