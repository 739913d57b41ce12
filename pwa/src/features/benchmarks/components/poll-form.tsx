import { useId, useState, type FormEvent, type InputHTMLAttributes } from 'react';
import { FormProblem } from '../../../components/form-problem';
import { isApiError } from '../../../lib/api-error';
import type { BenchmarkPoll } from '../api/get-benchmarks';
import { useSaveBenchmark, type PollDraft } from '../api/save-benchmark';

interface Draft {
  source: string;
  fieldStart: string;
  fieldEnd: string;
  resultAs: 'percent' | 'count';
  result: string;
  sampleSize: string;
  methodGroup: string;
  groupBias: PollDraft['groupBias'];
  biasFactor: string;
}

const EMPTY: Draft = { source: '', fieldStart: '', fieldEnd: '', resultAs: 'percent', result: '', sampleSize: '', methodGroup: '', groupBias: 'unknown', biasFactor: '' };

function fromPoll(p: BenchmarkPoll): Draft {
  return { source: p.source, fieldStart: p.fieldStart, fieldEnd: p.fieldEnd, resultAs: 'count', result: String(p.yes), sampleSize: String(p.sampleSize), methodGroup: p.methodGroup, groupBias: p.groupBias, biasFactor: p.biasFactor === null ? '' : String(p.biasFactor) };
}

/** The draft as the API takes it; numbers the server checks (ranges, dates) are left to it. */
function toPoll(d: Draft): PollDraft {
  const number = (text: string) => (text.trim() === '' ? Number.NaN : Number(text.replace(',', '.')));
  const result = number(d.result);
  return {
    source: d.source,
    fieldStart: d.fieldStart,
    fieldEnd: d.fieldEnd,
    ...(d.resultAs === 'percent' ? { share: result / 100 } : { yes: result }),
    sampleSize: number(d.sampleSize),
    methodGroup: d.methodGroup,
    groupBias: d.groupBias,
    ...(d.groupBias === 'known' ? { biasFactor: number(d.biasFactor) } : {}),
  };
}

function Field({ label, problem, hint, ...input }: { label: string; problem?: string; hint?: string } & Omit<InputHTMLAttributes<HTMLInputElement>, 'id'>) {
  const id = useId();
  return (
    <div className="pl-field">
      <label htmlFor={id}>{label}</label>
      <input id={id} aria-invalid={problem ? true : undefined} aria-describedby={problem || hint ? `${id}-note` : undefined} {...input} />
      {problem || hint ? <span id={`${id}-note`} className={problem ? 'pl-field-problem' : 'pl-small pl-muted'}>{problem ?? hint}</span> : null}
    </div>
  );
}

interface PollFormProps {
  projectId: string;
  poll?: BenchmarkPoll;
  groups: string[];
  onDone: () => void;
}

/** Records another poll, or changes one; the group's bias applies to all its polls. */
export function PollForm({ projectId, poll, groups, onDone }: PollFormProps) {
  const [draft, setDraft] = useState<Draft>(poll ? fromPoll(poll) : EMPTY);
  const save = useSaveBenchmark(projectId);
  const listId = useId();
  const set = (field: keyof Draft) => (event: { target: { value: string } }) => setDraft({ ...draft, [field]: event.target.value });
  const fields = isApiError(save.error) ? save.error.fields : [];
  const problem = (field: string) => fields.find((f) => f.field === field)?.message;
  const submit = (event: FormEvent) => {
    event.preventDefault();
    save.mutate({ poll: toPoll(draft), id: poll?.id }, { onSuccess: onDone });
  };
  return (
    <form className="pl-form pl-benchmark-form" onSubmit={submit} noValidate aria-label={poll ? `Change ${poll.source}` : 'Record another poll'}>
      <Field label="Source" value={draft.source} onChange={set('source')} problem={problem('source')} hint="Who published it, e.g. the paper and the pollster." />
      <div className="pl-field-pair">
        <Field label="Field start" type="date" value={draft.fieldStart} onChange={set('fieldStart')} problem={problem('fieldStart')} />
        <Field label="Field end" type="date" value={draft.fieldEnd} onChange={set('fieldEnd')} problem={problem('fieldEnd')} />
      </div>
      <div className="pl-field">
        <label htmlFor={`${listId}-as`}>Result given as</label>
        <select id={`${listId}-as`} className="pl-select" value={draft.resultAs} onChange={set('resultAs')}>
          <option value="percent">Share saying yes (%)</option>
          <option value="count">Number saying yes</option>
        </select>
      </div>
      <div className="pl-field-pair">
        <Field label={draft.resultAs === 'percent' ? 'Yes (%)' : 'Yes (count)'} inputMode="decimal" value={draft.result} onChange={set('result')} problem={problem(draft.resultAs === 'percent' ? 'share' : 'yes')} />
        <Field label="Sample size" inputMode="numeric" value={draft.sampleSize} onChange={set('sampleSize')} problem={problem('sampleSize')} />
      </div>
      <Field label="Method group" list={`${listId}-groups`} value={draft.methodGroup} onChange={set('methodGroup')} problem={problem('methodGroup')} hint="Polls made the same way (e.g. online panel, phone) share one bias factor." />
      <datalist id={`${listId}-groups`}>{groups.map((g) => <option key={g} value={g} />)}</datalist>
      <div className="pl-field">
        <label htmlFor={`${listId}-bias`}>What is known of the group’s bias</label>
        <select id={`${listId}-bias`} className="pl-select" value={draft.groupBias} onChange={set('groupBias')}>
          <option value="unknown">Unknown</option>
          <option value="none">None: the group is unbiased</option>
          <option value="known">A known bias factor</option>
        </select>
      </div>
      {draft.groupBias === 'known' ? (
        <Field label="Bias factor" inputMode="decimal" value={draft.biasFactor} onChange={set('biasFactor')} problem={problem('biasFactor')} hint="Between 0 and 1: 0.5 is no bias, above 0.5 the group overstates." />
      ) : null}
      <FormProblem message={save.error?.message} />
      <div className="pl-form-actions">
        <button type="button" className="pl-button" onClick={onDone}>Cancel</button>
        <button type="submit" className="pl-button pl-button-main" disabled={save.isPending}>
          {save.isPending ? 'Saving…' : poll ? 'Save the poll' : 'Record the poll'}
        </button>
      </div>
    </form>
  );
}
