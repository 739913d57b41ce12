import { useId } from 'react';
import type { BoardView, StatusFilter } from './board-view';
import { heading, WORDS } from '../../../lib/glossary';

const statusChoices: { value: StatusFilter; label: string }[] = [
  { value: 'all', label: 'All cells' },
  { value: 'open', label: 'Open' },
  { value: 'nearly_full', label: 'Nearly full' },
  { value: 'full', label: 'Full' },
  { value: 'closed', label: 'Closed' },
  { value: 'over_quota', label: heading(WORDS.overQuota.one) },
];

interface BoardFiltersProps {
  view: BoardView;
  onChange: (view: BoardView) => void;
  shown: number;
  total: number;
  /** A category of this project, to show what the search takes. */
  example?: string;
}

export function BoardFilters({ view, onChange, shown, total, example }: BoardFiltersProps) {
  const statusId = useId();
  const textId = useId();
  return (
    <div className="pl-filters" role="search" aria-label="Filter cells">
      <div className="pl-filter">
        <label htmlFor={statusId}>Status</label>
        <select
          id={statusId}
          className="pl-select"
          value={view.status}
          onChange={(event) => onChange({ ...view, status: event.target.value as StatusFilter })}
        >
          {statusChoices.map((choice) => (
            <option key={choice.value} value={choice.value}>
              {choice.label}
            </option>
          ))}
        </select>
      </div>
      <div className="pl-filter pl-filter-text">
        <label htmlFor={textId}>Find a cell</label>
        <input
          id={textId}
          className="pl-input"
          type="search"
          placeholder={example ? `e.g. ${example}` : 'a category'}
          value={view.text}
          onChange={(event) => onChange({ ...view, text: event.target.value })}
        />
      </div>
      <p className="pl-filter-count pl-small pl-muted" aria-live="polite">
        {shown === total ? `${total} cells` : `${shown} of ${total} cells`}
      </p>
    </div>
  );
}
