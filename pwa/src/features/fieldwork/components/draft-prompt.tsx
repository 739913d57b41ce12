import type { ContactDraft } from '../../../db/plumbline-db';
import { dispositionWords } from '../../../lib/fieldwork-words';
import { formatMoment } from '../../../lib/format';

interface DraftPromptProps {
  draft: ContactDraft;
  /** The draft's project, when it is still assigned to this interviewer. */
  projectName: string | undefined;
  onFinish: () => void;
  onDiscard: () => void;
}

/** A contact left unfinished for more than a day, or for a project no longer assigned: finish or discard. */
export function DraftPrompt({ draft, projectName, onFinish, onDiscard }: DraftPromptProps) {
  const what = draft.step === 'outcome' ? 'A contact' : `A ${dispositionWords[draft.disposition].toLowerCase()}`;
  return (
    <section className="pl-state pl-draft-prompt" aria-labelledby="pl-draft-title">
      <h2 id="pl-draft-title">Unfinished contact</h2>
      <p>
        {what} started {formatMoment(draft.startedAt)}
        {projectName ? ` for ${projectName}` : ''} was not saved. It is still on this device.
      </p>
      {projectName ? null : <p className="pl-muted">Its project is no longer assigned to you, so it can only be discarded.</p>}
      <div className="pl-step-actions">
        {projectName ? (
          <button type="button" className="pl-button pl-button-main pl-button-wide" onClick={onFinish}>
            Finish it
          </button>
        ) : null}
        <button type="button" className="pl-button pl-button-quiet pl-button-wide" onClick={onDiscard}>
          Discard it
        </button>
      </div>
    </section>
  );
}
