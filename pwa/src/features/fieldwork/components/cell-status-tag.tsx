import type { CellStatus } from '../../../db/plumbline-db';
import { cellStatusWords } from '../../../lib/fieldwork-words';

/** The status as a word with a shape beside it, so it never relies on colour alone. */
export function CellStatusTag({ status }: { status: CellStatus }) {
  return <span className={`pl-cell-tag is-${status.replace('_', '-')}`}>{cellStatusWords[status]}</span>;
}

/** "age_band: 18-24 × sex: female" → "age band: 18-24 × sex: female". */
export function cellWord(label: string): string {
  return label.replace(/_/g, ' ');
}
