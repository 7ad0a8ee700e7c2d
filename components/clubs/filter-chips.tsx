import { ChoiceChips } from '../ui/choice-chips';

export type FilterChipsProps<T extends string> = {
  label: string;
  options: { value: T; label: string; count?: number }[];
  value: T;
  onChange: (value: T) => void;
};

/** One filter out of a few, as chips with a count each; read out as "Status: Ready". */
export function FilterChips<T extends string>({ label, options, value, onChange }: FilterChipsProps<T>) {
  return (
    <ChoiceChips
      label={label}
      labelVariant="caption"
      value={value}
      onChange={onChange}
      options={options.map((option) => ({
        value: option.value,
        label: option.count === undefined ? option.label : `${option.label} (${option.count})`,
        accessibilityLabel: `${label}: ${option.label}`,
      }))}
    />
  );
}
