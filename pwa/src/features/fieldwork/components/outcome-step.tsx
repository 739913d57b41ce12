import { useState } from 'react';
import { RadioGroup } from '../../../components/radio-group';
import type { Disposition } from '../../../db/plumbline-db';
import { dispositionHints, dispositionOrder, dispositionWords } from '../../../lib/fieldwork-words';

const outcomes = dispositionOrder.map((disposition) => ({
  value: disposition,
  label: dispositionWords[disposition],
  hint: dispositionHints[disposition],
  className: disposition === 'complete' ? 'is-main' : '',
}));

/**
 * Step 1: what happened at this contact. Six large options, reachable with one thumb: a tap
 * (or Space or Enter) chooses one and moves on; the arrow keys only move between them.
 */
export function OutcomeStep({ onChoose }: { onChoose: (disposition: Disposition) => void }) {
  const [browsing, setBrowsing] = useState<Disposition>();
  return (
    <section aria-labelledby="pl-outcome-title">
      <h2 id="pl-outcome-title" className="pl-step-title" tabIndex={-1}>
        What happened?
      </h2>
      <RadioGroup
        labelledBy="pl-outcome-title"
        options={outcomes}
        value={browsing}
        optionClassName="pl-choice"
        className="pl-choice-grid"
        onChoose={(disposition, how) => (how === 'arrow' ? setBrowsing(disposition) : onChoose(disposition))}
      />
    </section>
  );
}
