import type { HeadlineAnswer } from '../../../db/plumbline-db';
import { headlineAnswerOrder, headlineAnswerWords } from '../../../lib/fieldwork-words';

interface AnswerStepProps {
  question: string;
  answer: HeadlineAnswer | undefined;
  onAnswer: (answer: HeadlineAnswer) => void;
  onSave: () => void;
  saving: boolean;
}

/** Last step of a complete: the headline question, answered yes, no, don't know or no answer. */
export function AnswerStep({ question, answer, onAnswer, onSave, saving }: AnswerStepProps) {
  return (
    <section aria-labelledby="pl-answer-title">
      <h2 id="pl-answer-title" className="pl-step-title">
        The headline question
      </h2>
      <p className="pl-question" id="pl-question">
        {question}
      </p>
      <div role="radiogroup" aria-labelledby="pl-question" className="pl-category-grid pl-answer-grid">
        {headlineAnswerOrder.map((value) => (
          <button
            key={value}
            type="button"
            role="radio"
            aria-checked={answer === value}
            className={`pl-category pl-answer ${answer === value ? 'is-selected' : ''}`}
            onClick={() => onAnswer(value)}
          >
            {headlineAnswerWords[value]}
          </button>
        ))}
      </div>
      <div className="pl-step-actions">
        <button type="button" className="pl-button pl-button-main pl-button-wide" disabled={answer === undefined || saving} onClick={onSave}>
          Save interview
        </button>
      </div>
    </section>
  );
}
