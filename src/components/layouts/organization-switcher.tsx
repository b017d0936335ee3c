import { useId } from 'react';

interface OrganizationSwitcherProps {
  options: { value: string; label: string }[];
  value: string;
  onChange: (orgId: string) => void;
}

/** A labelled native select: the most dependable control on phones and with screen readers. */
export function OrganizationSwitcher({ options, value, onChange }: OrganizationSwitcherProps) {
  const id = useId();
  return (
    <div className="flex min-w-0 items-center gap-2">
      <label htmlFor={id} className="sr-only text-sm font-bold text-field-700 md:not-sr-only">
        Organization
      </label>
      <select
        id={id}
        value={value}
        onChange={(event) => onChange(event.target.value)}
        className="min-h-touch w-full max-w-[18rem] min-w-0 truncate rounded-lg border border-field-300 bg-white px-3 py-2 font-bold text-field-900 hover:border-field-500"
      >
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
    </div>
  );
}
