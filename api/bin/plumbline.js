#!/usr/bin/env node
// Runs the compiled command line when the api has been built, else the TypeScript source
// through tsx, so `npx plumbline` works in a fresh checkout.
import { existsSync } from 'node:fs';

const compiled = new URL('../dist/cli/main.js', import.meta.url);
if (existsSync(compiled)) {
  await import(compiled.href);
} else {
  const { register } = await import('tsx/esm/api');
  register();
  await import(new URL('../src/cli/main.ts', import.meta.url).href);
}
