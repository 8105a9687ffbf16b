import { useId, type TextareaHTMLAttributes } from "react";

/** A labelled multi-line input with an optional message under it, styled like TextField. */
export function TextAreaField({ label, error, ...props }: TextareaHTMLAttributes<HTMLTextAreaElement> & { label: string; error?: string }) {
  const id = useId();
  const errorId = `${id}-error`;
  return (
    // The label sits beside the control, not around it, so the control's own text (the chosen option)
    // does not become part of its accessible name.
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-semibold text-ink">
        {label}
      </label>
      <textarea
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? errorId : undefined}
        rows={3}
        {...props}
        className="block w-full rounded-card border border-line-strong bg-surface px-3 py-2 text-base text-ink placeholder:text-ink-muted"
      />
      {error && (
        <span id={errorId} className="block text-sm text-error-ink">
          {error}
        </span>
      )}
    </div>
  );
}
