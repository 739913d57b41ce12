import { useId, useState } from 'react';
import { FormProblem } from '../../../components/form-problem';
import { RadioGroup } from '../../../components/radio-group';
import type { BackcheckOutcome } from '../api/get-backchecks';
import { outcomeHints, outcomeOrder, outcomeWords } from './outcome-words';

const NOTE_MAX = 1000;
const options = outcomeOrder.map((value) => ({ value, label: outcomeWords[value], hint: outcomeHints[value] }));

interface OutcomeFormProps {
  busy: boolean;
  problem: string | undefined;
  onSave: (value: { outcome: BackcheckOutcome; note?: string }) => void;
  onCancel: () => void;
}

/** What the call-back found (one of three) and a note, required when it did not confirm. */
export function OutcomeForm({ busy, problem, onSave, onCancel }: OutcomeFormProps) {
  const id = useId();
  const [outcome, setOutcome] = useState<BackcheckOutcome>();
  const [note, setNote] = useState('');
  const [mistake, setMistake] = useState<string>();
  function submit() {
    if (!outcome) return setMistake('Choose what the call-back found.');
    if (outcome === 'not_confirmed' && !note.trim()) return setMistake('Say what differed from the interview.');
    setMistake(undefined);
    onSave({ outcome, ...(note.trim() ? { note: note.trim() } : {}) });
  }
  return (
    <form
      className="pl-backcheck-form"
      aria-label="Back-check outcome"
      onSubmit={(event) => {
        event.preventDefault();
        submit();
      }}
    >
      <p id={`${id}-what`} className="pl-backcheck-question">
        What did the call-back find?
      </p>
      <RadioGroup labelledBy={`${id}-what`} options={options} value={outcome} onChoose={setOutcome} className="pl-backcheck-choices" optionClassName="pl-backcheck-option" />
      <div className="pl-field">
        <label htmlFor={`${id}-note`}>{outcome === 'not_confirmed' ? 'What differed (required)' : 'Note (optional)'}</label>
        <textarea id={`${id}-note`} value={note} maxLength={NOTE_MAX} onChange={(event) => setNote(event.target.value)} aria-describedby={mistake ? `${id}-problem` : undefined} />
      </div>
      <FormProblem message={mistake ?? problem} id={`${id}-problem`} />
      <div className="pl-form-actions">
        <button type="button" className="pl-button pl-button-quiet pl-button-small" onClick={onCancel}>
          Cancel
        </button>
        <button type="submit" className="pl-button pl-button-main pl-button-small" disabled={busy}>
          {busy ? 'Saving…' : 'Save outcome'}
        </button>
      </div>
    </form>
  );
}
