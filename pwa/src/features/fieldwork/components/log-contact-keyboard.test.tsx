// Logging a contact with the keyboard and a screen reader: one tab stop per set of choices,
// arrow keys between them (WAI-ARIA APG radio group), focus on each new step's heading and
// the step announced in a polite live region (WCAG 2.2 SC 2.4.3 Focus Order, 4.1.3 Status Messages).
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { db } from '../../../db/plumbline-db';
import { installFakeApi } from '../../../test/fake-api';
import { syncedBefore } from '../../../test/field-fixtures';
import { renderApp, signedInAs } from '../../../test/render-app';
import { whenSyncIdle } from '../../../sync/sync-engine';

const me = 'user-interviewer';

beforeEach(async () => {
  installFakeApi().setNetwork('down');
  await signedInAs('interviewer');
  await syncedBefore(me);
});

afterEach(async () => {
  await whenSyncIdle();
});

async function openLog() {
  const user = userEvent.setup();
  renderApp('/interviewer');
  await user.click(await screen.findByRole('button', { name: 'Log a contact for Vellmoor tram extension' }));
  return user;
}

/** The step as announced: its words, in a polite live region. */
function expectAnnounced(words: string) {
  const region = screen.getByText(words);
  expect(region).toHaveAttribute('aria-live', 'polite');
  expect(region).toHaveAttribute('role', 'status');
}

describe('logging a contact from the keyboard', () => {
  it('makes the outcomes one tab stop, moves between them with the arrow keys and goes on only when one is chosen', async () => {
    const user = await openLog();
    const outcomes = screen.getByRole('radiogroup', { name: 'What happened?' });
    const options = within(outcomes).getAllByRole('radio');
    expect(options.map((option) => option.tabIndex)).toEqual([0, -1, -1, -1, -1, -1]);

    options[0]!.focus();
    await user.keyboard('{ArrowDown}{ArrowDown}');
    expect(options[2]).toHaveFocus();
    expect(options[2]).toBeChecked();
    expect(options[2]).toHaveAccessibleName('Refusal');
    // Browsing the outcomes does not leave the step.
    expect(screen.getByRole('heading', { name: 'What happened?' })).toBeInTheDocument();

    await user.keyboard(' ');
    const heading = await screen.findByRole('heading', { name: 'Refusal' });
    expect(heading).toHaveFocus();
    expectAnnounced('Step 2 of 2: save refusal');
  });

  it('moves focus to each step’s heading and announces it, through a whole complete', async () => {
    const user = await openLog();
    await user.click(screen.getByRole('radio', { name: 'Complete' }));
    expect(screen.getByRole('heading', { name: 'Who is the respondent?' })).toHaveFocus();
    expectAnnounced('Step 2 of 4: categories');

    // Each variable is one tab stop; the arrow keys choose within it.
    const age = within(screen.getByRole('radiogroup', { name: 'Age band' })).getAllByRole('radio');
    await user.tab();
    expect(age[0]).toHaveFocus();
    await user.keyboard('{ArrowRight}');
    expect(age[1]).toBeChecked();
    await user.tab();
    const region = within(screen.getByRole('radiogroup', { name: 'Region' })).getAllByRole('radio');
    expect(region[0]).toHaveFocus();
    await user.keyboard('{End}');
    expect(region[1]).toBeChecked();
    await user.keyboard('{Home}');
    expect(region[0]).toBeChecked();
    expect(region[1]).not.toBeChecked();

    await user.click(screen.getByRole('button', { name: 'Check their cells' }));
    expect(screen.getByRole('heading', { name: 'Their cells' })).toHaveFocus();
    expectAnnounced('Step 3 of 4: their cells');

    await user.click(screen.getByRole('button', { name: 'Start the interview' }));
    expect(screen.getByRole('heading', { name: 'The headline question' })).toHaveFocus();
    expectAnnounced('Step 4 of 4: the headline question');
    const answers = within(screen.getByRole('radiogroup', { name: 'Do you support extending the tram line?' })).getAllByRole('radio');
    await user.tab();
    expect(answers[0]).toHaveFocus();
    await user.keyboard('{ArrowRight}');
    expect(answers[1]).toBeChecked();
    expect(answers[1]).toHaveAccessibleName('No');
    // The chosen answer is the group's one tab stop.
    expect(answers.map((answer) => answer.tabIndex)).toEqual([-1, 0, -1, -1]);

    await user.click(screen.getByRole('button', { name: 'Save interview' }));
    expect(await screen.findByText(/Complete saved on this device/)).toBeInTheDocument();
    const [entry] = await db.outbox.toArray();
    expect(entry!.payload).toMatchObject({ categories: { 'v-age': 'c-old', 'v-region': 'c-mardon' }, headlineAnswer: 'no' });
  });
});
