import type { ButtonHTMLAttributes } from "react";

type Variant = "primary" | "secondary" | "quiet";

const VARIANTS: Record<Variant, string> = {
  primary: "bg-tide text-on-tide hover:bg-tide-strong disabled:opacity-60",
  secondary: "border border-line-strong bg-surface text-ink hover:bg-tide-soft disabled:opacity-60",
  quiet: "text-tide hover:underline disabled:opacity-60",
};

/** Leeway's button: one look per purpose, nothing alarming. */
export function Button({ variant = "primary", className = "", ...props }: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant }) {
  return (
    <button
      {...props}
      className={`inline-flex items-center justify-center gap-2 rounded-card px-4 py-2 text-sm font-semibold transition-colors ${VARIANTS[variant]} ${className}`}
    />
  );
}
