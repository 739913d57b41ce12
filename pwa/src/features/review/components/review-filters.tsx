import { useId } from 'react';
import type { ReviewOptions } from '../api/get-review-options';
import type { ReviewFilters } from '../api/get-review-queue';
import { formatCalendarDate } from '../../../lib/format';

interface Choice {
  value: string;
  label: string;
}

function FilterSelect({ label, value, choices, all, onChange }: { label: string; value: string | undefined; choices: Choice[]; all: string; onChange: (value: string | undefined) => void }) {
  const id = useId();
  return (
    <div className="pl-filter">
      <label htmlFor={id}>{label}</label>
      <select id={id} className="pl-select" value={value ?? ''} onChange={(event) => onChange(event.target.value || undefined)}>
        <option value="">{all}</option>
        {choices.map((c) => (
          <option key={c.value} value={c.value}>
            {c.label}
          </option>
        ))}
      </select>
    </div>
  );
}

const statusChoices: Choice[] = [
  { value: 'pending', label: 'Awaiting review' },
  { value: 'approved', label: 'Approved' },
  { value: 'rejected', label: 'Rejected' },
];

/** The queue's filters: flag, interviewer, field day, cell and review status. */
export function ReviewFiltersBar({ filters, options, onChange }: { filters: ReviewFilters; options: ReviewOptions | undefined; onChange: (filters: ReviewFilters) => void }) {
  const set = (key: keyof ReviewFilters) => (value: string | undefined) => onChange({ ...filters, [key]: value });
  return (
    <div className="pl-filters pl-review-filters" role="search" aria-label="Filter the review queue">
      <FilterSelect label="Flag" value={filters.flag} all="Any flag or none" onChange={set('flag')}
        choices={(options?.flags ?? []).map((f) => ({ value: f.code, label: f.label }))} />
      <FilterSelect label="Interviewer" value={filters.interviewerId} all="Everyone" onChange={set('interviewerId')}
        choices={(options?.interviewers ?? []).map((p) => ({ value: p.id, label: p.name }))} />
      <FilterSelect label="Field day" value={filters.fieldDay} all="Every day" onChange={set('fieldDay')}
        choices={(options?.fieldDays ?? []).map((d) => ({ value: d, label: formatCalendarDate(d) }))} />
      <FilterSelect label="Cell" value={filters.cellId} all="Every cell" onChange={set('cellId')}
        choices={(options?.cells ?? []).map((c) => ({ value: c.id, label: c.label }))} />
      <FilterSelect label="Status" value={filters.status} all="Any status" onChange={set('status')} choices={statusChoices} />
    </div>
  );
}
