// The focus indicator must stand out at 3:1 or more against what lies next to it, on every
// surface the app paints: WCAG 2.2 SC 1.4.11 Non-text Contrast (AA) and SC 2.4.13 Focus
// Appearance (AAA), https://www.w3.org/TR/WCAG22/. With a two-colour indicator (WCAG 2.2
// technique C40, https://www.w3.org/WAI/WCAG22/Techniques/css/C40) the two colours must differ
// by 3:1 from each other, and on each background at least one of them must reach 3:1.
// The colours are read from the style sheets themselves, so changing one re-runs the sums.
import { readdirSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

// Every style sheet of the app (Vitest hands CSS imports over empty, so they are read as files).
const source = resolve(import.meta.dirname, '../..');
const css = readdirSync(source, { recursive: true, encoding: 'utf8' })
  .filter((file) => file.endsWith('.css'))
  .sort()
  .map((file) => readFileSync(join(source, file), 'utf8'))
  .join('\n');

/** Custom properties declared in the style sheets (the last declaration wins, as in the cascade). */
function customProperties(): Map<string, string> {
  const properties = new Map<string, string>();
  for (const match of css.matchAll(/(--[\w-]+)\s*:\s*([^;}]+)/g)) properties.set(match[1]!, match[2]!.trim());
  return properties;
}

const properties = customProperties();

function resolveValue(value: string, depth = 0): string {
  const reference = /^var\((--[\w-]+)\)$/.exec(value.trim());
  if (!reference) return value.trim();
  const next = properties.get(reference[1]!);
  if (next === undefined || depth > 10) throw new Error(`${reference[1]} is not declared`);
  return resolveValue(next, depth + 1);
}

type Rgb = [number, number, number];

function parseColour(value: string): { rgb: Rgb; alpha: number } | undefined {
  const hex = /^#([0-9a-f]{6})$/i.exec(value);
  if (hex) {
    const n = parseInt(hex[1]!, 16);
    return { rgb: [n >> 16, (n >> 8) & 255, n & 255], alpha: 1 };
  }
  const rgba = /^rgba?\(\s*(\d+),\s*(\d+),\s*(\d+)(?:,\s*([\d.]+))?\s*\)$/.exec(value);
  if (rgba) return { rgb: [Number(rgba[1]), Number(rgba[2]), Number(rgba[3])], alpha: rgba[4] === undefined ? 1 : Number(rgba[4]) };
  return undefined;
}

/** Relative luminance, WCAG 2.2 definition (sRGB, threshold 0.04045 as in IEC 61966-2-1). */
function luminance([r, g, b]: Rgb): number {
  const linear = (c: number) => {
    const s = c / 255;
    return s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
  };
  return 0.2126 * linear(r) + 0.7152 * linear(g) + 0.0722 * linear(b);
}

/** Contrast ratio, WCAG 2.2: (L1 + 0.05) / (L2 + 0.05), lighter over darker. */
function contrast(a: Rgb, b: Rgb): number {
  const [light, dark] = [luminance(a), luminance(b)].sort((x, y) => y - x) as [number, number];
  return (light + 0.05) / (dark + 0.05);
}

function over(top: Rgb, alpha: number, base: Rgb): Rgb {
  return top.map((c, i) => Math.round(c * alpha + base[i]! * (1 - alpha))) as Rgb;
}

function colour(name: string): Rgb {
  const parsed = parseColour(resolveValue(`var(${name})`));
  if (!parsed || parsed.alpha !== 1) throw new Error(`${name} is not an opaque colour`);
  return parsed.rgb;
}

// Translucent washes sit on the teal header (navigation and the online badge); the dialog's
// dimming layer holds no focusable element (the dialog card on it is --pl-card).
const header = colour('--ion-toolbar-background');
const notASurface = /\.pl-dialog-backdrop\s*\{[^}]*\}/g;

/** Every solid or translucent background colour the style sheets paint, as opaque colours. */
function backgrounds(): { source: string; rgb: Rgb }[] {
  const found = new Map<string, Rgb>();
  for (const match of css.replace(notASurface, '').matchAll(/background(?:-color)?\s*:\s*([^;}]+)/g)) {
    const parsed = parseColour(resolveValue(match[1]!));
    if (!parsed) continue; // gradients, currentColor, none, transparent: drawn over one of the others
    found.set(match[1]!.trim(), parsed.alpha === 1 ? parsed.rgb : over(parsed.rgb, parsed.alpha, header));
  }
  for (const name of ['--ion-background-color', '--ion-toolbar-background', '--ion-color-primary']) found.set(`var(${name})`, colour(name));
  return [...found].map(([source, rgb]) => ({ source, rgb }));
}

describe('the focus indicator', () => {
  const ring = colour('--pl-focus-ring');
  const halo = colour('--pl-focus-halo');

  it('is drawn with both rings on every focusable element', () => {
    const rule = /^:focus-visible\s*\{([^}]*)\}/m.exec(css)?.[1] ?? '';
    expect(rule).toMatch(/outline:\s*\d+px solid var\(--pl-focus-ring\)/);
    expect(rule).toMatch(/box-shadow:\s*0 0 0 \d+px var\(--pl-focus-halo\)/);
    // No other rule takes the indicator away from a focusable element when it shows.
    expect(css).not.toMatch(/:focus-visible[^{]*\{[^}]*outline:\s*(none|0)/);
  });

  it('has rings that differ from each other by 3:1 or more (technique C40)', () => {
    expect(contrast(ring, halo)).toBeGreaterThanOrEqual(3);
  });

  it('reaches 3:1 with one of its rings on every background the app paints', () => {
    const surfaces = backgrounds();
    expect(surfaces.length).toBeGreaterThan(8);
    const short = surfaces
      .map(({ source, rgb }) => ({ source, best: Math.max(contrast(ring, rgb), contrast(halo, rgb)) }))
      .filter(({ best }) => best < 3);
    expect(short).toEqual([]);
  });

  it('would fail with the old single brass ring, about 2.1:1 on the page', () => {
    // The measurement the change answers (issue 10): brass on paper.
    expect(contrast(colour('--pl-brass'), colour('--pl-paper'))).toBeCloseTo(2.08, 2);
  });
});
