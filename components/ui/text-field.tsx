import { useId, type InputHTMLAttributes } from "react";

/** A labelled input with an optional message under it, linked for screen readers. */
export function TextField({ label, error, ...props }: InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string }) {
  const id = useId();
  const errorId = `${id}-error`;
  return (
    <label htmlFor={id} className="block space-y-1">
      <span className="text-sm font-semibold text-ink">{label}</span>
      <input
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? errorId : undefined}
        {...props}
        className="block w-full rounded-card border border-line-strong bg-surface px-3 py-2 text-base text-ink placeholder:text-ink-muted"
      />
      {error && (
        <span id={errorId} className="block text-sm text-error-ink">
          {error}
        </span>
      )}
    </label>
  );
}
