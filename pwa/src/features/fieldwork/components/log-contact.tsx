// Logs one contact in a few taps: outcome; for a complete the respondent's categories, a
// look at their cells before the interview proper, then the headline answer. startedAt is
// the moment the contact was started, endedAt the moment of saving; the record goes to the
// device's outbox first (sync/log-contact), whatever the network. Every step is kept as a
// draft on the device (db/draft-store), so a reload or crash resumes where it stopped.
import { useEffect, useMemo, useRef, useState } from 'react';
import { discardDraft, saveDraft } from '../../../db/draft-store';
import type { ContactDraft, Disposition, DraftStep, FieldProject, HeadlineAnswer } from '../../../db/plumbline-db';
import { dispositionWords, headlineAnswerOf } from '../../../lib/fieldwork-words';
import { respondentCells } from '../../../sync/cell-status';
import { logContact } from '../../../sync/log-contact';
import type { ProjectCellStatus } from '../hooks/use-field-status';
import { referenceProblem } from '@plumbline/cell-rules/respondent-reference';
import { AnswerStep } from './answer-step';
import { AssignedCellsNote } from './assigned-cells-note';
import { CategoriesStep } from './categories-step';
import { CellCheckStep } from './cell-check-step';
import { EligibilityQuestion } from './eligibility-question';
import { ObservedCategories } from './observed-categories';
import { OutcomeStep } from './outcome-step';
import { ReferenceField } from './reference-field';
import { FormProblem } from '../../../components/form-problem';
import { stepAnnouncement } from './log-steps';

/** Outcomes where the interviewer met someone and may record the categories they could see. */
const OBSERVABLE = new Set<Disposition>(['partial', 'refusal']);
/** Outcomes where nobody was interviewed and it may not be known whether someone eligible lives there. */
const ELIGIBILITY_ASKED = new Set<Disposition>(['non_contact', 'other']);

interface LogContactProps {
  userId: string;
  project: FieldProject;
  status: ProjectCellStatus | undefined;
  /** A contact left unfinished on this device, to carry on with. */
  draft?: ContactDraft;
  /** Both say which contact (by its start) is done with, so a late read of its draft is ignored. */
  onSaved: (message: string, startedAt: string) => void;
  onCancel: (startedAt: string) => void;
}

export function LogContact({ userId, project, status, draft, onSaved, onCancel }: LogContactProps) {
  const [startedAt] = useState(() => draft?.startedAt ?? new Date().toISOString());
  const [step, setStep] = useState<DraftStep>(draft?.step ?? 'outcome');
  const [disposition, setDisposition] = useState<Disposition>(draft?.disposition ?? 'complete');
  const [categories, setCategories] = useState<Record<string, string>>(draft?.categories ?? {});
  const [answer, setAnswer] = useState<HeadlineAnswer | undefined>(headlineAnswerOf(draft?.headlineAnswer));
  const [eligibilityKnown, setEligibilityKnown] = useState<boolean | undefined>(draft?.eligibilityKnown);
  const [reference, setReference] = useState('');
  const [referenceMistake, setReferenceMistake] = useState<string>();
  const [saving, setSaving] = useState(false);
  const [problem, setProblem] = useState<string>();
  const variables = status?.variables ?? [];
  const top = useRef<HTMLDivElement>(null);

  // Each step starts at the top of the screen, with the project name in view; after a step
  // (not on opening) focus goes to the new step's heading and the live region names it, so
  // keyboard and screen-reader users land where sighted users look (WCAG 2.2 SC 2.4.3, 4.1.3).
  const [announcement, setAnnouncement] = useState('');
  const shownStep = useRef<DraftStep>(undefined);
  useEffect(() => {
    if (shownStep.current === step) return;
    const opening = shownStep.current === undefined;
    shownStep.current = step;
    const content = top.current?.closest('ion-content') as (HTMLElement & { scrollToTop?: (ms?: number) => Promise<void> }) | null;
    void content?.scrollToTop?.(0);
    if (opening) return;
    top.current?.querySelector<HTMLElement>('h2[tabindex="-1"]')?.focus();
    setAnnouncement(stepAnnouncement(step, disposition));
  }, [step, disposition]);

  // Kept on the device after every step; nothing is written until the first choice.
  const started = useRef(draft !== undefined);
  useEffect(() => {
    if (!started.current) {
      started.current = true;
      return;
    }
    void saveDraft({ interviewerId: userId, projectId: project.id, step, disposition, categories, headlineAnswer: answer, eligibilityKnown, startedAt });
  }, [userId, project.id, step, disposition, categories, answer, eligibilityKnown, startedAt]);

  function cancel() {
    void discardDraft(userId).then(() => onCancel(startedAt));
  }

  const theirCells = useMemo(
    () => respondentCells(status?.cells ?? [], Object.values(categories)),
    [status, categories],
  );

  async function save(chosen: Disposition) {
    const code = reference.trim();
    const mistake = chosen === 'complete' && code ? (referenceProblem(code) ?? undefined) : undefined;
    setReferenceMistake(mistake);
    if (mistake) return;
    setSaving(true);
    setProblem(undefined);
    try {
      await logContact(userId, project.id, {
        disposition: chosen,
        startedAt,
        ...(chosen === 'complete' ? { categories, headlineAnswer: answer, ...(code ? { respondentReference: code } : {}) } : {}),
        ...((OBSERVABLE.has(chosen) || chosen === 'quota_full') && Object.keys(categories).length > 0 ? { categories } : {}),
        ...(ELIGIBILITY_ASKED.has(chosen) && eligibilityKnown !== undefined ? { eligibilityKnown } : {}),
      });
      onSaved(`${dispositionWords[chosen]} saved on this device.`, startedAt);
    } catch (error) {
      setSaving(false);
      setProblem(`Could not save on this device: ${error instanceof Error ? error.message : 'unknown problem'}. Nothing was stored; please try again.`);
    }
  }

  function choose(chosen: Disposition) {
    setDisposition(chosen);
    setStep(chosen === 'complete' ? 'categories' : 'confirm');
  }

  return (
    <div className="pl-log" ref={top}>
      <div className="pl-log-head">
        <p className="pl-log-project">{project.name}</p>
        <button type="button" className="pl-button pl-button-quiet" onClick={cancel}>
          Cancel
        </button>
      </div>
      <p className="pl-muted pl-small pl-privacy">
        Record no names, addresses or phone numbers: only categories, the answer and times.
      </p>
      <p className="pl-visually-hidden" role="status" aria-live="polite">
        {announcement}
      </p>
      <FormProblem message={problem} />

      {step === 'outcome' ? <OutcomeStep onChoose={choose} /> : null}

      {step === 'confirm' ? (
        <section aria-labelledby="pl-confirm-title">
          <h2 id="pl-confirm-title" className="pl-step-title" tabIndex={-1}>
            {dispositionWords[disposition]}
          </h2>
          {OBSERVABLE.has(disposition) && variables.length > 0 ? (
            <ObservedCategories
              variables={variables}
              chosen={categories}
              onChange={(variableId, categoryId) =>
                setCategories(({ [variableId]: _old, ...rest }) => (categoryId ? { ...rest, [variableId]: categoryId } : rest))
              }
            />
          ) : null}
          {ELIGIBILITY_ASKED.has(disposition) ? <EligibilityQuestion value={eligibilityKnown} onChange={setEligibilityKnown} /> : null}
          <div className="pl-step-actions">
            <button type="button" className="pl-button pl-button-main pl-button-wide" disabled={saving} onClick={() => void save(disposition)}>
              Save {dispositionWords[disposition].toLowerCase()}
            </button>
            <button type="button" className="pl-button pl-button-quiet pl-button-wide" onClick={() => setStep('outcome')}>
              Choose another outcome
            </button>
          </div>
        </section>
      ) : null}

      {step === 'categories' && variables.length === 0 ? (
        <section className="pl-form-note" role="status">
          <p>
            To log a complete this device needs the project’s quota variables from one sync with the network. Other
            outcomes can be logged now.
          </p>
          <button type="button" className="pl-button pl-button-quiet" onClick={() => setStep('outcome')}>
            Choose another outcome
          </button>
        </section>
      ) : null}

      {step === 'categories' && variables.length > 0 ? (
        <CategoriesStep
          variables={variables}
          chosen={categories}
          onChange={(variableId, categoryId) => setCategories((c) => ({ ...c, [variableId]: categoryId }))}
          onNext={() => setStep('check')}
        />
      ) : null}

      {step === 'check' ? <AssignedCellsNote project={project} theirCells={theirCells} /> : null}
      {step === 'check' ? (
        <CellCheckStep
          cells={theirCells}
          syncedAt={status?.syncedAt ?? null}
          onStart={() => setStep('answer')}
          onBack={() => setStep('categories')}
          onTurnAway={() => void save('quota_full')}
          saving={saving}
        />
      ) : null}

      {step === 'answer' ? (
        <AnswerStep
          question={project.headlineQuestion}
          answer={answer}
          onAnswer={setAnswer}
          saving={saving}
          onSave={() => void save('complete')}
          extra={<ReferenceField value={reference} onChange={setReference} problem={referenceMistake} />}
        />
      ) : null}
    </div>
  );
}
