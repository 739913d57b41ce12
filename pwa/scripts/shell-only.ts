// Build-time helper for the service worker's precache list: keeps the scripts the entry
// loads statically (the shell) and drops the lazily loaded ones (each role's pages, the
// charts), which the service worker caches at run time when they are first used.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { ManifestTransform } from 'workbox-build';

interface ChunkInfo {
  file: string;
  isEntry?: boolean;
  imports?: string[];
}

/** Files reachable from the entry through static imports, read from Vite's build manifest. */
export function shellFiles(distDir: string): Set<string> {
  const manifest = JSON.parse(readFileSync(join(distDir, '.vite/manifest.json'), 'utf8')) as Record<string, ChunkInfo>;
  const files = new Set<string>();
  const visit = (key: string) => {
    const chunk = manifest[key];
    if (!chunk || files.has(chunk.file)) return;
    files.add(chunk.file);
    for (const next of chunk.imports ?? []) visit(next);
  };
  for (const [key, chunk] of Object.entries(manifest)) if (chunk.isEntry) visit(key);
  return files;
}

export function shellOnly(distDir: string): ManifestTransform {
  return async (entries) => {
    const shell = shellFiles(distDir);
    const isLazyScript = (url: string) => url.startsWith('assets/') && url.endsWith('.js') && !shell.has(url);
    return { manifest: entries.filter((entry) => !isLazyScript(entry.url)), warnings: [] };
  };
}
