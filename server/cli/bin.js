#!/usr/bin/env node
// Entry point of `npx reachline`: registers tsx so the TypeScript CLI runs without a build step.
import { register } from 'tsx/esm/api';

register();
const { main } = await import('./main.ts');
process.exitCode = await main(process.argv.slice(2));
