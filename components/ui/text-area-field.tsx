import type { TextareaHTMLAttributes } from "react";
import { Field } from "./field";

/** A labelled multi-line input with an optional message under it, styled like TextField. */
export function TextAreaField({ label, error, ...props }: TextareaHTMLAttributes<HTMLTextAreaElement> & { label: string; error?: string }) {
  return (
    <Field label={label} error={error}>
      {(control) => (
        <textarea
          {...control}
          rows={3}
          {...props}
          className="block w-full rounded-card border border-line-strong bg-surface px-3 py-2 text-base text-ink placeholder:text-ink-muted"
        />
      )}
    </Field>
  );
}
