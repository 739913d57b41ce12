import type { ReactNode } from 'react';
import { RadioGroup } from '../../../components/radio-group';
import type { HeadlineAnswer } from '../../../db/plumbline-db';
import { headlineAnswerOrder, headlineAnswerWords } from '../../../lib/fieldwork-words';

interface AnswerStepProps {
  question: string;
  answer: HeadlineAnswer | undefined;
  onAnswer: (answer: HeadlineAnswer) => void;
  onSave: () => void;
  saving: boolean;
  /** Shown between the answer and the save button (the contact-sheet reference). */
  extra?: ReactNode;
}

const answers = headlineAnswerOrder.map((value) => ({ value, label: headlineAnswerWords[value], className: 'pl-answer' }));

/** Last step of a complete: the headline question, answered yes, no, don't know or no answer. */
export function AnswerStep({ question, answer, onAnswer, onSave, saving, extra }: AnswerStepProps) {
  return (
    <section aria-labelledby="pl-answer-title">
      <h2 id="pl-answer-title" className="pl-step-title" tabIndex={-1}>
        The headline question
      </h2>
      <p className="pl-question" id="pl-question">
        {question}
      </p>
      <RadioGroup labelledBy="pl-question" options={answers} value={answer} onChoose={onAnswer} className="pl-category-grid pl-answer-grid" />
      {extra}
      <div className="pl-step-actions">
        <button type="button" className="pl-button pl-button-main pl-button-wide" disabled={answer === undefined || saving} onClick={onSave}>
          Save interview
        </button>
      </div>
    </section>
  );
}
