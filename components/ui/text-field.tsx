import { useId, type InputHTMLAttributes } from "react";

/**
 * A labelled input with an optional message under it. The message sits outside the label and is
 * linked by aria-describedby, so it is announced without becoming part of the field's name.
 */
export function TextField({ label, error, ...props }: InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string }) {
  const id = useId();
  const errorId = `${id}-error`;
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-semibold text-ink">
        {label}
      </label>
      <input
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? errorId : undefined}
        {...props}
        className="block w-full rounded-card border border-line-strong bg-surface px-3 py-2 text-base text-ink placeholder:text-ink-muted"
      />
      {error && (
        <p id={errorId} className="text-sm text-error-ink">
          {error}
        </p>
      )}
    </div>
  );
}
