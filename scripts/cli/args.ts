import { CliError } from "./cli-error";

/** Options a command accepts: name → whether it takes a value. */
export type OptionSpec = Record<string, "value" | "flag">;

/** Parsed `--name value` and `--flag` options. */
export type ParsedOptions = Record<string, string | true>;

/** Parses `--name value` / `--name=value` / `--flag`, refusing unknown options and stray words. */
export function parseOptions(args: readonly string[], spec: OptionSpec, command: string): ParsedOptions {
  const out: ParsedOptions = {};
  for (let i = 0; i < args.length; i++) {
    const arg = args[i];
    if (!arg.startsWith("--")) throw new CliError(`${command}: unexpected argument "${arg}"`);
    const [name, inline] = arg.slice(2).split(/=(.*)/s, 2);
    const kind = spec[name];
    if (!kind) throw new CliError(`${command}: unknown option --${name} (known: ${Object.keys(spec).map((k) => `--${k}`).join(", ")})`);
    if (kind === "flag") {
      if (inline !== undefined) throw new CliError(`${command}: --${name} takes no value`);
      out[name] = true;
      continue;
    }
    const value = inline ?? args[++i];
    if (value === undefined || (inline === undefined && value.startsWith("--"))) throw new CliError(`${command}: --${name} needs a value`);
    out[name] = value;
  }
  return out;
}

/** The value of a required option. */
export function requireOption(options: ParsedOptions, name: string, command: string): string {
  const value = options[name];
  if (typeof value !== "string") throw new CliError(`${command}: --${name} is required`);
  return value;
}

/** A positive number option, or undefined when absent. */
export function numberOption(options: ParsedOptions, name: string, command: string): number | undefined {
  const value = options[name];
  if (value === undefined) return undefined;
  const n = typeof value === "string" ? Number(value) : Number.NaN;
  if (!Number.isFinite(n) || n <= 0) throw new CliError(`${command}: --${name} must be a positive number, got "${String(value)}"`);
  return n;
}
