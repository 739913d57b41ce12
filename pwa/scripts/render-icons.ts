// Renders Plumbline's icon (a plumb bob on its line above a level mark) to the PNGs the
// manifest lists, using Debian's chromium through playwright-core. Run it after changing
// the drawing and commit the PNGs:  npm run icons -w pwa
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium } from 'playwright-core';

const publicDir = fileURLToPath(new URL('../public', import.meta.url));
const teal = '#1d4f54';
const paper = '#f6f3ec';
const brass = '#d6a24a';

// The drawing on a 64-unit grid; `inset` shrinks it towards the centre (maskable safe zone).
function drawing(inset: number): string {
  const s = 1 - inset;
  const t = 32 * inset;
  return `<g transform="translate(${t} ${t}) scale(${s})">
    <line x1="32" y1="7" x2="32" y2="31" stroke="${paper}" stroke-width="2.6" stroke-linecap="round"/>
    <rect x="27.5" y="29.5" width="9" height="4.5" rx="1.2" fill="${brass}"/>
    <path d="M22.5 34 H41.5 L33.2 53.2 Q32 55.6 30.8 53.2 Z" fill="${brass}"/>
    <line x1="20" y1="58" x2="44" y2="58" stroke="${paper}" stroke-width="2.6" stroke-linecap="round" opacity="0.85"/>
  </g>`;
}

export function iconSvg({ maskable = false }: { maskable?: boolean } = {}): string {
  const background = maskable
    ? `<rect width="64" height="64" fill="${teal}"/>`
    : `<rect width="64" height="64" rx="14" fill="${teal}"/>`;
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 64 64">${background}${drawing(maskable ? 0.22 : 0)}</svg>`;
}

const targets = [
  { file: 'icons/icon-192.png', size: 192, maskable: false },
  { file: 'icons/icon-512.png', size: 512, maskable: false },
  { file: 'icons/maskable-192.png', size: 192, maskable: true },
  { file: 'icons/maskable-512.png', size: 512, maskable: true },
  { file: 'icons/apple-touch-icon-180.png', size: 180, maskable: true },
];

const userDataDir = mkdtempSync(join(tmpdir(), 'plumbline-icons-'));
const context = await chromium.launchPersistentContext(userDataDir, {
  executablePath: '/usr/bin/chromium',
  headless: true,
  args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
    '--disable-background-networking', '--disable-component-update', '--disable-sync'],
});
try {
  const page = await context.newPage();
  for (const { file, size, maskable } of targets) {
    await page.setViewportSize({ width: size, height: size });
    await page.setContent(`<!doctype html><style>html,body{margin:0;background:transparent}svg{display:block;width:${size}px;height:${size}px}</style>${iconSvg({ maskable })}`);
    await page.screenshot({ path: join(publicDir, file), omitBackground: true });
    console.log(`wrote ${file}`);
  }
  writeFileSync(join(publicDir, 'favicon.svg'), `${iconSvg()}\n`);
  console.log('wrote favicon.svg');
} finally {
  await context.close();
  rmSync(userDataDir, { recursive: true, force: true });
}
