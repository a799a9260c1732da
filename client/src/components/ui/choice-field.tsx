import { SelectField, type SelectFieldProps } from './field';

// A select with a first choice meaning "any" (an empty value), then one option for each choice; onPick
// hands back the choice itself, or undefined for "any", so callers never parse the option's text.
export interface ChoiceFieldProps<Value extends string> extends Omit<SelectFieldProps, 'children' | 'onChange'> {
  choices: readonly { value: Value; label: string }[];
  onPick: (value: Value | undefined) => void;
  anyLabel?: string;
}

export function ChoiceField<Value extends string>({ choices, onPick, anyLabel, ...rest }: ChoiceFieldProps<Value>) {
  return (
    <SelectField
      {...rest}
      onChange={(event) => onPick(choices.find((choice) => choice.value === event.target.value)?.value)}
    >
      {anyLabel === undefined ? null : <option value="">{anyLabel}</option>}
      {choices.map((choice) => (
        <option key={choice.value} value={choice.value}>
          {choice.label}
        </option>
      ))}
    </SelectField>
  );
}
