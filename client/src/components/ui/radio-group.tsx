import { useId, type ReactNode } from 'react';
import { FieldError } from './field';

export interface RadioGroupProps<Value extends string> {
  legend: ReactNode;
  choices: readonly Value[];
  labelOf: (value: Value) => ReactNode;
  // The current choice, if any; the state holding it may be of a wider type than the choices.
  value: string | null;
  onChange: (value: Value) => void;
  error?: string;
  // tiles: a row of framed choices, the one picked framed thicker; list: plain choices one under another.
  look?: 'tiles' | 'list';
  // The legend's size: large above a form's main choice, plain inside a section that already has a heading.
  legendSize?: 'large' | 'plain';
  name?: string;
  className?: string;
  'data-testid'?: string;
}

const TILE =
  'flex min-h-tap cursor-pointer items-center gap-2 rounded-lg border-2 border-line bg-surface px-4 ' +
  'has-[:checked]:border-4 has-[:checked]:border-primary';

// One choice out of a few, as radio buttons in a fieldset, with its error beside it.
export function RadioGroup<Value extends string>({
  legend,
  choices,
  labelOf,
  value,
  onChange,
  error,
  look = 'tiles',
  legendSize = 'large',
  name,
  className = '',
  'data-testid': testId,
}: RadioGroupProps<Value>) {
  const id = useId();
  const errorId = `${id}-error`;
  return (
    <fieldset className={className} aria-describedby={error ? errorId : undefined} data-testid={testId}>
      <legend className={`mb-2 font-bold ${legendSize === 'large' ? 'text-xl' : ''}`}>{legend}</legend>
      <div className={look === 'tiles' ? 'flex flex-wrap gap-tap-gap' : 'flex flex-col gap-2'}>
        {choices.map((choice) => (
          <label
            key={choice}
            className={look === 'tiles' ? TILE : 'inline-flex min-h-tap cursor-pointer items-center gap-3'}
          >
            <input
              type="radio"
              name={name ?? id}
              value={choice}
              checked={value === choice}
              onChange={() => onChange(choice)}
              className="size-6 shrink-0"
            />
            <span className={look === 'tiles' ? 'font-bold' : undefined}>{labelOf(choice)}</span>
          </label>
        ))}
      </div>
      <FieldError id={errorId} message={error} />
    </fieldset>
  );
}
