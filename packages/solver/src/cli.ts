/**
 * Command line: `pnpm --silent solve FILE` (or `-` for standard input). Prints the result JSON on
 * standard output and exits 0; on an expected failure prints {"error":{code,message,where}} on
 * standard error and exits 2; a usage error exits 64 (EX_USAGE). The only module with I/O.
 */
import { readFileSync } from "node:fs";
import { SolverError, type SolverFailure } from "./errors.js";
import { solve } from "./solve.js";

const USAGE = "usage: solve FILE   (FILE is a spanwright.beam/1 JSON model; - reads standard input)";

function readInput(file: string): string {
  return readFileSync(file === "-" ? 0 : file, "utf8");
}

function failWith(error: SolverFailure): never {
  process.stderr.write(`${JSON.stringify({ error })}\n`);
  process.exit(2);
}

function main(args: string[]): void {
  if (args.length !== 1 || args[0] === "-h" || args[0] === "--help") {
    process.stderr.write(`${USAGE}\n`);
    process.exit(64);
  }
  const file = args[0]!;
  let text: string;
  try {
    text = readInput(file);
  } catch (cause) {
    failWith({ code: "invalid-model", message: `cannot read ${file === "-" ? "standard input" : file}: ${(cause as Error).message}`, where: "(file)" });
  }
  let model: unknown;
  try {
    model = JSON.parse(text);
  } catch (cause) {
    failWith({ code: "invalid-model", message: `not valid JSON: ${(cause as Error).message}`, where: "(file)" });
  }
  try {
    process.stdout.write(`${JSON.stringify(solve(model))}\n`);
  } catch (cause) {
    if (cause instanceof SolverError) failWith(cause.toJSON());
    throw cause;
  }
}

main(process.argv.slice(2));
