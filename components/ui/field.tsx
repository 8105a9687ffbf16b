import { useId, type ReactNode } from "react";

/** What a control needs to be tied to its label and message. */
export interface FieldControlProps {
  id: string;
  "aria-invalid"?: true;
  "aria-describedby"?: string;
}

/**
 * One form field: a label beside the control (not around it, so the control's own text does not
 * become part of its accessible name) and an optional message linked by aria-describedby.
 */
export function Field({ label, error, children }: { label: string; error?: string; children: (control: FieldControlProps) => ReactNode }) {
  const id = useId();
  const errorId = `${id}-error`;
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-semibold text-ink">
        {label}
      </label>
      {children({ id, "aria-invalid": error ? true : undefined, "aria-describedby": error ? errorId : undefined })}
      {error && (
        <p id={errorId} className="text-sm text-error-ink">
          {error}
        </p>
      )}
    </div>
  );
}
