import type { Disposition, DraftStep } from '../../../db/plumbline-db';
import { dispositionWords } from '../../../lib/fieldwork-words';

// The steps of logging a contact as a screen reader hears them: a complete takes four,
// any other outcome two (the outcome, then saving it).
const completeSteps: [DraftStep, string][] = [
  ['outcome', 'outcome'],
  ['categories', 'categories'],
  ['check', 'their cells'],
  ['answer', 'the headline question'],
];

export function stepAnnouncement(step: DraftStep, disposition: Disposition): string {
  if (step === 'confirm') return `Step 2 of 2: save ${dispositionWords[disposition].toLowerCase()}`;
  const index = completeSteps.findIndex(([name]) => name === step);
  const of = step === 'outcome' && disposition !== 'complete' ? 2 : completeSteps.length;
  return `Step ${index + 1} of ${of}: ${completeSteps[index]![1]}`;
}
