/** A problem with the command line or its input files: reported on stderr, exit code 2, nothing on stdout. */
export class CliError extends Error {
  constructor(
    message: string,
    readonly lines: string[] = [],
  ) {
    super(message);
    this.name = "CliError";
  }
}
