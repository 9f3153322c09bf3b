/**
 * Global setup of the e2e project: one headless Chromium for the whole run, which every test file
 * connects to (starting a browser per session took about 2 s each). Closed when the run ends.
 */
import type { TestProject } from 'vitest/node';
import { launchChromiumServer } from './chromium';

declare module 'vitest' {
  export interface ProvidedContext {
    chromiumWsEndpoint: string;
  }
}

export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const server = await launchChromiumServer();
  project.provide('chromiumWsEndpoint', server.wsEndpoint());
  return () => server.close();
}
