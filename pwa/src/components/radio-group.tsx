// One set of choices with one tab stop, after the WAI-ARIA Authoring Practices' radio group
// pattern (https://www.w3.org/WAI/ARIA/apg/patterns/radio/): Tab enters at the chosen option
// (or the first), the arrow keys, Home and End move to another option and choose it, and
// Space, Enter or a tap choose the option in focus. `onChoose` says how the choice was made,
// so a step that moves on after a tap can stay put while the arrow keys browse.
import { useRef, type KeyboardEvent, type ReactNode } from 'react';

export interface RadioOption<T> {
  value: T;
  label: ReactNode;
  /** Extra words read after the label (the option's hint). */
  hint?: ReactNode;
  className?: string;
}

interface RadioGroupProps<T> {
  /** Id of the element that names the group (a heading or the question). */
  labelledBy: string;
  options: RadioOption<T>[];
  value: T | undefined;
  onChoose: (value: T, how: 'activate' | 'arrow') => void;
  className?: string;
  optionClassName?: string;
}

const step: Record<string, number> = { ArrowDown: 1, ArrowRight: 1, ArrowUp: -1, ArrowLeft: -1 };

export function RadioGroup<T>({ labelledBy, options, value, onChoose, className, optionClassName = 'pl-category' }: RadioGroupProps<T>) {
  const buttons = useRef<(HTMLButtonElement | null)[]>([]);
  const chosenIndex = options.findIndex((option) => option.value === value);
  const tabStop = chosenIndex >= 0 ? chosenIndex : 0;

  function onKeyDown(event: KeyboardEvent, index: number) {
    let next: number | undefined;
    if (event.key in step) next = (index + step[event.key]! + options.length) % options.length;
    else if (event.key === 'Home') next = 0;
    else if (event.key === 'End') next = options.length - 1;
    if (next === undefined) return;
    event.preventDefault();
    buttons.current[next]?.focus();
    onChoose(options[next]!.value, 'arrow');
  }

  return (
    <div role="radiogroup" aria-labelledby={labelledBy} className={className}>
      {options.map((option, index) => {
        const selected = index === chosenIndex;
        const hintId = option.hint ? `${labelledBy}-hint-${index}` : undefined;
        return (
          <button
            key={String(option.value)}
            ref={(element) => {
              buttons.current[index] = element;
            }}
            type="button"
            role="radio"
            aria-checked={selected}
            aria-describedby={hintId}
            tabIndex={index === tabStop ? 0 : -1}
            className={`${optionClassName} ${option.className ?? ''} ${selected ? 'is-selected' : ''}`}
            onClick={() => onChoose(option.value, 'activate')}
            onKeyDown={(event) => onKeyDown(event, index)}
          >
            {option.hint ? (
              <>
                <span className="pl-choice-word">{option.label}</span>
                <span className="pl-choice-hint" id={hintId} aria-hidden="true">
                  {option.hint}
                </span>
              </>
            ) : (
              option.label
            )}
          </button>
        );
      })}
    </div>
  );
}
