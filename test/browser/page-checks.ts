// What the accessibility check asks of every page: axe-core's rules (Deque's engine, the
// one the W3C's ACT rules are written against) with no serious or critical violation, and
// nothing wider than the phone: the document no wider than the viewport and no element
// running past its right edge unless it sits in a box that scrolls on its own.
import { AxeBuilder } from '@axe-core/playwright';
import type { Page } from 'playwright-core';

export interface PageProblem {
  page: string;
  problem: string;
}

/** Waits until the page shows its heading and nothing is still loading. */
export async function settled(page: Page): Promise<void> {
  await page.locator('.ion-page:not(.ion-page-hidden) h1, main h1, h1').first().waitFor();
  await page.waitForFunction(() => document.querySelector('.pl-state-loading, .pl-splash') === null, undefined, { timeout: 15_000 });
  // Ionic's page transition has ended and fonts are in, so the layout is the final one.
  await page.evaluate(async () => {
    await document.fonts.ready;
    await new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(resolve)));
  });
}

export async function checkPage(page: Page, name: string): Promise<PageProblem[]> {
  const problems: PageProblem[] = [];
  const results = await new AxeBuilder({ page }).analyze();
  for (const violation of results.violations) {
    if (violation.impact !== 'serious' && violation.impact !== 'critical') continue;
    const where = violation.nodes
      .slice(0, 3)
      .map((node) => `${node.target.join(' ')}${node.failureSummary ? ` (${node.failureSummary.split('\n').slice(1, 2).join('').trim()})` : ''}`)
      .join('; ');
    problems.push({ page: name, problem: `${violation.impact} ${violation.id}: ${violation.help} — ${where}` });
  }
  const widths = await page.evaluate(() => {
    const viewport = document.documentElement.clientWidth;
    const scrolls = (element: Element) => /(auto|scroll)/.test(getComputedStyle(element).overflowX);
    const inScrollBox = (element: Element) => {
      for (let parent = element.parentElement; parent && parent !== document.body; parent = parent.parentElement) {
        if (scrolls(parent)) return true;
      }
      return false;
    };
    const past = [...document.querySelectorAll('body *')]
      .filter((element) => !element.closest('.ion-page-hidden, [aria-hidden="true"]'))
      .filter((element) => {
        const rect = element.getBoundingClientRect();
        return rect.width > 1 && rect.height > 1 && rect.right > viewport + 1 && getComputedStyle(element).visibility !== 'hidden';
      })
      .filter((element) => !inScrollBox(element))
      .map((element) => {
        const text = (element.textContent ?? '').trim().slice(0, 40);
        return `${element.tagName.toLowerCase()}${element.className && typeof element.className === 'string' ? `.${element.className.trim().split(/\s+/).join('.')}` : ''} "${text}" to ${Math.round(element.getBoundingClientRect().right)} px`;
      });
    return { scrollWidth: document.documentElement.scrollWidth, viewport, past };
  });
  if (widths.scrollWidth > widths.viewport) problems.push({ page: name, problem: `the page is ${widths.scrollWidth} px wide at ${widths.viewport} px` });
  for (const element of widths.past.slice(0, 8)) problems.push({ page: name, problem: `runs past the right edge: ${element}` });
  return problems;
}
