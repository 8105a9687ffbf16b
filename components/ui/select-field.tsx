import { useId, type SelectHTMLAttributes } from "react";

/** A labelled select with an optional message under it, styled like TextField. */
export function SelectField({
  label,
  error,
  options,
  ...props
}: SelectHTMLAttributes<HTMLSelectElement> & { label: string; error?: string; options: readonly { value: string; label: string }[] }) {
  const id = useId();
  const errorId = `${id}-error`;
  return (
    <label htmlFor={id} className="block space-y-1">
      <span className="text-sm font-semibold text-ink">{label}</span>
      <select
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? errorId : undefined}
        {...props}
        className="block w-full rounded-card border border-line-strong bg-surface px-3 py-2 text-base text-ink"
      >
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
      {error && (
        <span id={errorId} className="block text-sm text-error-ink">
          {error}
        </span>
      )}
    </label>
  );
}
