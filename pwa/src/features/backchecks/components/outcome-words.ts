import type { BackcheckOutcome } from '../api/get-backchecks';

export const outcomeOrder: BackcheckOutcome[] = ['confirmed', 'not_confirmed', 'not_reached'];

export const outcomeWords: Record<BackcheckOutcome, string> = {
  confirmed: 'Confirmed',
  not_confirmed: 'Not confirmed',
  not_reached: 'Could not reach',
};

export const outcomeHints: Record<BackcheckOutcome, string> = {
  confirmed: 'The respondent confirms the interview took place as recorded.',
  not_confirmed: 'Something differed: say what. The interview goes to the review queue.',
  not_reached: 'No answer yet; you can record another outcome later.',
};
