import type { SelectHTMLAttributes } from "react";
import { Field } from "./field";

/** A labelled select with an optional message under it, styled like TextField. */
export function SelectField({
  label,
  error,
  options,
  ...props
}: SelectHTMLAttributes<HTMLSelectElement> & { label: string; error?: string; options: readonly { value: string; label: string }[] }) {
  return (
    <Field label={label} error={error}>
      {(control) => (
        <select {...control} {...props} className="block w-full rounded-card border border-line-strong bg-surface px-3 py-2 text-base text-ink">
          {options.map((option) => (
            <option key={option.value} value={option.value}>
              {option.label}
            </option>
          ))}
        </select>
      )}
    </Field>
  );
}
