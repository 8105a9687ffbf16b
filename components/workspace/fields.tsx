"use client";

import { useId, useState } from "react";

/** Text of a number as the field shows it. */
const show = (value: number | undefined) => (value === undefined || Number.isNaN(value) ? "" : String(value));

/**
 * A labelled number input with its unit. The typed text is kept as typed; the value passed on is
 * the number, NaN for text that is not one (the scenario schema then names the field), or
 * undefined when the field is left empty and `optional` (the documented default applies).
 */
export function NumberField({
  label,
  unit,
  value,
  onChange,
  error,
  optional,
  placeholder,
  step = "any",
  testId,
  hint,
  hideLabel,
}: {
  label: string;
  /** Keep the label for screen readers only (e.g. in a table whose header names the column). */
  hideLabel?: boolean;
  unit?: string;
  value: number | undefined;
  onChange: (value: number | undefined) => void;
  error?: string;
  optional?: boolean;
  placeholder?: string;
  step?: string;
  testId?: string;
  hint?: string;
}) {
  const id = useId();
  const [text, setText] = useState(show(value));
  const [shownValue, setShownValue] = useState(value);
  // Follow changes made elsewhere (a drag on the map) unless the text already means that value.
  if (!Object.is(shownValue, value)) {
    setShownValue(value);
    const meansValue = Number(text) === value || (text.trim() === "" && value === undefined) || (Number.isNaN(value) && text.trim() !== "");
    if (!meansValue) setText(show(value));
  }
  const describedBy = [error ? `${id}-error` : null, hint ? `${id}-hint` : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className="space-y-0.5">
      <label htmlFor={id} className={hideLabel ? "sr-only" : "block text-xs font-semibold text-ink"}>
        {label}
        {unit ? <span className="font-normal text-ink-muted"> ({unit})</span> : null}
      </label>
      <input
        id={id}
        inputMode="decimal"
        step={step}
        value={text}
        placeholder={placeholder}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        data-testid={testId}
        onChange={(event) => {
          const next = event.target.value;
          setText(next);
          const trimmed = next.trim();
          if (trimmed === "" && optional) onChange(undefined);
          else onChange(trimmed === "" ? Number.NaN : Number(trimmed.replace("−", "-")));
        }}
        className="block w-full rounded-card border border-line-strong bg-surface px-2 py-1 text-sm text-ink placeholder:text-ink-muted disabled:bg-paper"
      />
      {hint && (
        <span id={`${id}-hint`} className="block text-xs text-ink-muted">
          {hint}
        </span>
      )}
      {error && (
        <span id={`${id}-error`} className="block text-xs text-error-ink" data-testid={testId ? `${testId}-error` : undefined}>
          {error}
        </span>
      )}
    </div>
  );
}

/** A small labelled select for the workspace's forms. */
export function SmallSelect<V extends string>({
  label,
  value,
  options,
  onChange,
  error,
  testId,
}: {
  label: string;
  value: V;
  options: readonly { value: V; label: string }[];
  onChange: (value: V) => void;
  error?: string;
  testId?: string;
}) {
  const id = useId();
  return (
    <div className="space-y-0.5">
      <label htmlFor={id} className="block text-xs font-semibold text-ink">
        {label}
      </label>
      <select
        id={id}
        value={value}
        data-testid={testId}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        onChange={(event) => onChange(event.target.value as V)}
        className="block w-full rounded-card border border-line-strong bg-surface px-2 py-1 text-sm text-ink disabled:bg-paper"
      >
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
      {error && (
        <span id={`${id}-error`} className="block text-xs text-error-ink">
          {error}
        </span>
      )}
    </div>
  );
}

/** A titled group of fields. */
export function FieldGroup({ title, children, note }: { title: string; children: React.ReactNode; note?: React.ReactNode }) {
  return (
    <fieldset className="space-y-2 rounded-card border border-line p-3">
      <legend className="px-1 text-sm font-semibold">{title}</legend>
      {note && <p className="text-xs text-ink-muted">{note}</p>}
      {children}
    </fieldset>
  );
}
