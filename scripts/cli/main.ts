/**
 * Leeway's command line: the scenario engine on files. JSON on stdout; the caution, the
 * "how it was made" line and any errors on stderr; exit 2 on bad input, 1 on a failure.
 */
import { CAUTION, describeProvenance, type Provenance } from "@/lib/geo";
import { parseOptions, type OptionSpec, type ParsedOptions } from "./args";
import { CliError } from "./cli-error";
import { batchCommand } from "./commands/batch";
import { exposureCommand } from "./commands/exposure";
import { gridCommand } from "./commands/grid";
import { sitesCommand } from "./commands/sites";
import { registerModelModule } from "./inputs";

interface Command {
  name: string;
  summary: string;
  options: OptionSpec;
  run(options: ParsedOptions): { output: unknown; result: { provenance: Provenance } | undefined };
}

const COMMANDS: Command[] = [sitesCommand, gridCommand, exposureCommand, batchCommand];

function usage(): string {
  return [
    "usage: npm run --silent leeway -- <command> [options]",
    ...COMMANDS.map((c) => `  ${c.name.padEnd(9)} ${c.summary}\n            ${Object.keys(c.options).map((o) => `--${o}`).join(" ")}`),
    "see the README (scenario engine) for the file formats",
  ].join("\n");
}

async function main(argv: string[]): Promise<number> {
  process.stderr.write(`caution: ${CAUTION}\n`);
  const [name, ...rest] = argv;
  if (name === undefined || name === "help" || name === "--help") {
    process.stderr.write(`${usage()}\n`);
    return name === undefined ? 2 : 0;
  }
  const command = COMMANDS.find((c) => c.name === name);
  if (!command) throw new CliError(`unknown command "${name}"`, [usage()]);
  const options = parseOptions(rest, command.options, name);
  const modelModule = options["ground-motion-module"];
  if (typeof modelModule === "string") await registerModelModule(modelModule);
  const { output, result } = command.run(options);
  if (result) process.stderr.write(`how it was made: ${describeProvenance(result.provenance)}\n`);
  process.stdout.write(`${JSON.stringify(output)}\n`);
  return 0;
}

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    if (error instanceof CliError) {
      process.stderr.write(`leeway: ${error.message}\n${error.lines.map((l) => `  ${l}\n`).join("")}`);
      process.exitCode = 2;
    } else {
      process.stderr.write(`leeway: internal error: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
      process.exitCode = 1;
    }
  },
);
