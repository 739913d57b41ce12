import { useState, type FormEvent, type ReactNode } from 'react';
import { FormProblem } from '../../../components/form-problem';
import { QueryView } from '../../../components/query-view';
import { formatMoment } from '../../../lib/format';
import { useQualitySettings, useSaveQualitySettings, type QualitySettingsView } from '../api/quality-settings';
import { checkQualityDraft, toDraft, type QualityDraft, type QualityProblems } from './quality-draft';
import { TextField } from './text-field';

/** The project's quality rules for its lead: each rule's switch and thresholds, and the back-checks. */
export function QualitySection({ projectId, readOnly = false }: { projectId: string; readOnly?: boolean }) {
  const query = useQualitySettings(projectId);
  return (
    <QueryView query={query} what="the quality rules" offlineNote="The quality rules need the network." isEmpty={() => false} empty={null}>
      {(view) => <QualityForm projectId={projectId} view={view} readOnly={readOnly} />}
    </QueryView>
  );
}

function Rule({ title, on, onToggle, disabled, children, what }: { title: string; on: boolean; onToggle: (on: boolean) => void; disabled: boolean; children?: ReactNode; what: string }) {
  return (
    <fieldset className="pl-team-group pl-quality-rule" disabled={disabled}>
      <legend>
        <label className="pl-check">
          <input type="checkbox" role="switch" checked={on} onChange={(e) => onToggle(e.target.checked)} />
          {title}
        </label>
      </legend>
      <p className="pl-small pl-muted">{what}</p>
      {on ? children : null}
    </fieldset>
  );
}

function QualityForm({ projectId, view, readOnly }: { projectId: string; view: QualitySettingsView; readOnly: boolean }) {
  const save = useSaveQualitySettings(projectId);
  const [draft, setDraft] = useState<QualityDraft>(() => toDraft(view.settings));
  const [problems, setProblems] = useState<QualityProblems>({});
  const [saved, setSaved] = useState(false);
  const change = (next: Partial<QualityDraft>) => {
    setDraft({ ...draft, ...next });
    setSaved(false);
  };
  const text = (field: keyof QualityDraft, label: string, hint?: string, inputMode: 'decimal' | 'numeric' = 'decimal') => (
    <TextField label={label} inputMode={inputMode} value={String(draft[field])} onChange={(e) => change({ [field]: e.target.value })} problem={problems[field]} hint={hint} />
  );
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const checked = checkQualityDraft(draft, view.settings);
    setProblems(checked.problems);
    if (!checked.settings) return;
    save.mutate(checked.settings, {
      onSuccess: (next) => {
        setDraft(toDraft(next.settings));
        setSaved(true);
      },
    });
  };

  return (
    <form className="pl-form pl-quality-form" onSubmit={submit} noValidate aria-label="Quality rules">
      <p className="pl-small pl-muted" role="status">
        {view.checkedAt ? `Flags last computed ${formatMoment(view.checkedAt)}; they are computed again after each sync and after you save.` : 'Flags not computed yet: they are computed after the first interviews arrive.'}
      </p>
      <Rule title="Too short" what="A complete much shorter than the project’s median complete." on={draft.tooShort} onToggle={(on) => change({ tooShort: on })} disabled={readOnly}>
        {text('fractionPercent', 'Share of the median complete (%)', 'Shorter than this share of the median is flagged; a third (33.3%) is common practice.')}
        {text('minimumMinutes', 'Or shorter than (minutes)', 'Optional: an absolute minimum.')}
      </Rule>
      <Rule title="Overlapping" what="An interviewer’s interviews whose start–end spans overlap." on={draft.overlapping} onToggle={(on) => change({ overlapping: on })} disabled={readOnly} />
      <Rule title="Out of hours" what="Started outside these hours, in the project’s time zone." on={draft.outOfHours} onToggle={(on) => change({ outOfHours: on })} disabled={readOnly}>
        <div className="pl-field-pair">
          {text('from', 'From (HH:MM)')}
          {text('to', 'To (HH:MM)')}
        </div>
      </Rule>
      <Rule title="Bursts" what="More completes by one interviewer within an hour than this." on={draft.bursts} onToggle={(on) => change({ bursts: on })} disabled={readOnly}>
        {text('perHour', 'Completes per hour allowed', undefined, 'numeric')}
      </Rule>
      <Rule title="Interviewer’s answers differ" what="An interviewer whose headline answers differ from the others’ in the same cells more than chance allows (Cochran–Mantel–Haenszel, false discovery rate by Benjamini–Hochberg)." on={draft.answers} onToggle={(on) => change({ answers: on })} disabled={readOnly}>
        {text('minimumCompletes', 'Completes before an interviewer is tested', undefined, 'numeric')}
        {text('falseDiscoveryRate', 'False discovery rate', 'Such as 0.10: about one in ten flagged interviewers may be flagged by chance.')}
      </Rule>
      <Rule title="Back-checks" what="A share of each interviewer’s completes verified by a call-back to the respondent." on={draft.backChecks} onToggle={(on) => change({ backChecks: on })} disabled={readOnly}>
        {text('sharePercent', 'Share of completes called back (%)', '10% is common practice.')}
        {text('raisePercent', 'Raise after one not confirmed (percentage points)', 'Added to that interviewer’s share for the rest of the field period.')}
        {text('keepReferenceDays', 'Delete respondent references after (days)', 'Counted from the back-check’s outcome.', 'numeric')}
      </Rule>
      <FormProblem message={Object.keys(problems).length > 0 ? 'Some settings need a look: see the notes above.' : save.error?.message} />
      {readOnly ? null : (
        <div className="pl-form-actions">
          <button type="submit" className="pl-button pl-button-main" disabled={save.isPending}>
            {save.isPending ? 'Saving…' : 'Save quality rules'}
          </button>
        </div>
      )}
      {saved ? (
        <p className="pl-saved" role="status">
          Quality rules saved; the flags are being computed again.
        </p>
      ) : null}
    </form>
  );
}
