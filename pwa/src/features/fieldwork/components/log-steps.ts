import type { Disposition, DraftStep } from '../../../db/plumbline-db';
import { dispositionWords } from '../../../lib/fieldwork-words';

// The steps of logging a contact as a screen reader hears them: a complete takes four,
// any other outcome two (the outcome, then saving it).
const completeSteps: Partial<Record<DraftStep, string>> = {
  outcome: 'outcome',
  categories: 'categories',
  check: 'their cells',
  answer: 'the headline question',
};

export function stepAnnouncement(step: DraftStep, disposition: Disposition): string {
  if (step === 'confirm') return `Step 2 of 2: save ${dispositionWords[disposition].toLowerCase()}`;
  const names = Object.entries(completeSteps);
  const index = names.findIndex(([name]) => name === step);
  if (index < 0) return '';
  return `Step ${index + 1} of ${disposition === 'complete' || step !== 'outcome' ? names.length : 2}: ${names[index]![1]}`;
}
