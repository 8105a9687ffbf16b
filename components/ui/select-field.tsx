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
    // The label sits beside the control, not around it, so the control's own text (the chosen option)
    // does not become part of its accessible name.
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-semibold text-ink">
        {label}
      </label>
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
    </div>
  );
}
