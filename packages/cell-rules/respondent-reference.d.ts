/** Longest respondent reference kept (characters). */
export declare const REFERENCE_MAX_LENGTH: number;

/**
 * Why a respondent reference cannot be kept, in plain words, or null when it is acceptable:
 * 1–20 letters, digits, '-', '_' or '/', and nothing that looks like an e-mail address or a
 * phone number (7 or more digits in a row, separators ignored).
 */
export declare function referenceProblem(reference: unknown): string | null;
