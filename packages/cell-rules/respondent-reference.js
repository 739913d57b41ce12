// The rule for a respondent reference, written once for the server (sync) and the device (the
// log-contact form). A reference is a short code from the agency's own contact sheet, so a
// supervisor can find the respondent again for a back-check. It is still pseudonymous personal
// data (GDPR Recital 26), so it must never be a direct identifier: no name (spaces and most
// punctuation are refused), no e-mail address, no phone number (7 or more digits in a row, spaces,
// dots, brackets, plus signs and - _ / between them ignored).

export const REFERENCE_MAX_LENGTH = 20;

const ALLOWED = /^[A-Za-z0-9_/-]+$/;

/** Why a reference cannot be kept, in plain words; null when it is acceptable. Trim first. */
export function referenceProblem(reference) {
  if (typeof reference !== 'string') return 'The reference must be text';
  if (reference.length === 0) return 'The reference must not be empty; leave it out instead';
  if (reference.includes('@')) return 'This looks like an e-mail address: enter only the code from your contact sheet';
  if (/\d{7,}/.test(reference.replace(/[-_/\s.()+]/g, ''))) {
    return 'This looks like a phone number: enter only the code from your contact sheet';
  }
  if (reference.length > REFERENCE_MAX_LENGTH) return `The reference must be at most ${REFERENCE_MAX_LENGTH} characters long`;
  if (!ALLOWED.test(reference)) return 'The reference may hold only letters, digits and - _ /';
  return null;
}
