import { RadioGroup } from '../../../components/radio-group';

const options = [
  { value: true, label: 'Yes' },
  { value: false, label: 'Not known' },
];

/**
 * For a non-contact or an 'other' outcome: whether someone eligible is known to live there. It
 * tells the office's rates a known-eligible case from one of unknown eligibility (AAPOR's NC or
 * UH, O or UO); left unanswered, it counts as not known.
 */
export function EligibilityQuestion({ value, onChange }: { value: boolean | undefined; onChange: (known: boolean) => void }) {
  return (
    <div className="pl-variable">
      <p id="pl-eligibility-question" className="pl-variable-name">
        Does someone in the survey’s population live here?
      </p>
      <RadioGroup labelledBy="pl-eligibility-question" options={options} value={value} onChoose={(known) => onChange(known)} className="pl-category-grid" />
    </div>
  );
}
