import type { Disposition } from '../../../db/plumbline-db';
import { dispositionHints, dispositionOrder, dispositionWords } from '../../../lib/fieldwork-words';

/** Step 1: what happened at this contact. Six large buttons, reachable with one thumb. */
export function OutcomeStep({ onChoose }: { onChoose: (disposition: Disposition) => void }) {
  return (
    <section aria-labelledby="pl-outcome-title">
      <h2 id="pl-outcome-title" className="pl-step-title">
        What happened?
      </h2>
      <div className="pl-choice-grid">
        {dispositionOrder.map((disposition) => (
          <button
            key={disposition}
            type="button"
            className={`pl-choice ${disposition === 'complete' ? 'is-main' : ''}`}
            aria-label={dispositionWords[disposition]}
            onClick={() => onChoose(disposition)}
          >
            <span className="pl-choice-word">{dispositionWords[disposition]}</span>
            <span className="pl-choice-hint" aria-hidden="true">
              {dispositionHints[disposition]}
            </span>
          </button>
        ))}
      </div>
    </section>
  );
}
