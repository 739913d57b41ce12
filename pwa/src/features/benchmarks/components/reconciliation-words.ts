import { formatDecimal } from '../../../lib/format';

/** What is known of a method group's bias, in words. */
export function biasWords(kind: string, factor: number | null | undefined, spread?: number): string {
  if (kind === 'none') return 'taken as unbiased';
  if (kind === 'known') return `known bias factor ${formatDecimal(factor ?? null, 3)}`;
  return spread === undefined ? 'bias unknown' : `bias unknown (factor around 0.5, spread ${spread})`;
}
