import { useId, useState, type FormEvent } from 'react';
import { FormProblem } from '../../../components/form-problem';
import { isApiError } from '../../../lib/api-error';
import type { Reconciliation } from '../api/get-reconciliation';
import { useSetSpread } from '../api/set-spread';

/** The cautions of the reconciliation, and (for the lead) the spread prior it used. */
export function ReconciliationCautions({ projectId, reconciliation: r, canChange }: { projectId: string; reconciliation: Reconciliation; canChange: boolean }) {
  return (
    <section className="pl-cautions" aria-labelledby="pl-reconcile-cautions">
      <h2 id="pl-reconcile-cautions">Read the reconciliation with care</h2>
      <ul>{r.cautions.map((c) => <li key={c}>{c}</li>)}</ul>
      {canChange ? <SpreadForm key={r.spread} projectId={projectId} spread={r.spread} defaultSpread={r.defaultSpread} /> : null}
    </section>
  );
}

function SpreadForm({ projectId, spread, defaultSpread }: { projectId: string; spread: number; defaultSpread: number }) {
  const [text, setText] = useState(String(spread));
  const save = useSetSpread(projectId);
  const id = useId();
  const problem = isApiError(save.error) ? save.error.fields.find((f) => f.field === 'spread')?.message : undefined;
  const submit = (event: FormEvent) => {
    event.preventDefault();
    save.mutate(text.trim() === '' ? Number.NaN : Number(text.replace(',', '.')));
  };
  return (
    <form className="pl-form" onSubmit={submit} noValidate>
      <div className="pl-field">
        <label htmlFor={id}>Spread prior of an unknown bias</label>
        <input id={id} inputMode="decimal" value={text} onChange={(e) => setText(e.target.value)} aria-invalid={problem ? true : undefined} aria-describedby={`${id}-note`} />
        <span id={`${id}-note`} className={problem ? 'pl-field-problem' : 'pl-small pl-muted'}>
          {problem ?? `Standard deviation of an unknown group's bias factor around 0.5 (default ${defaultSpread}).`}
        </span>
      </div>
      <FormProblem message={problem ? null : save.error?.message} />
      <div className="pl-form-actions">
        <button type="submit" className="pl-button" disabled={save.isPending}>{save.isPending ? 'Saving…' : 'Use this spread'}</button>
      </div>
    </form>
  );
}
