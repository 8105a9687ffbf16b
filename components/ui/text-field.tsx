import type { InputHTMLAttributes } from "react";
import { Field } from "./field";

/** A labelled input with an optional message under it. */
export function TextField({ label, error, ...props }: InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string }) {
  return (
    <Field label={label} error={error}>
      {(control) => (
        <input
          {...control}
          {...props}
          className="block w-full rounded-card border border-line-strong bg-surface px-3 py-2 text-base text-ink placeholder:text-ink-muted"
        />
      )}
    </Field>
  );
}
