/**
 * The calculation contract on the command line (docs/contract.md):
 *   npm run --silent calc -- evaluate|rate|resonator|reverb|air FILE     (FILE "-" = stdin)
 * Prints the result as JSON on stdout, exit 0. Every refusal is JSON on stderr with exit 2:
 * {"error": "invalid input", "issues": [{"field", "message"}]}, or {"error", "message"} for a
 * usage error, an unknown command, an unreadable file or invalid JSON. An unexpected failure
 * exits 1 with {"error": "internal error"}; no stack trace is printed.
 */
import { readFileSync } from "node:fs";
import { CONTRACT_COMMANDS, isContractCommand, runContract } from "../acoustics/contract";

const USAGE = `usage: npm run --silent calc -- <${CONTRACT_COMMANDS.join("|")}> FILE   (FILE "-" reads standard input)`;

function refuse(body: Record<string, unknown>, code = 2): never {
  process.stderr.write(`${JSON.stringify(body, null, 2)}\n`);
  process.exit(code);
}

function readInput(file: string): string {
  try {
    return readFileSync(file === "-" ? 0 : file, "utf8");
  } catch (error) {
    const reason = (error as NodeJS.ErrnoException).code ?? "read error";
    return refuse({ error: "unreadable file", message: `cannot read ${file === "-" ? "standard input" : file} (${reason})` });
  }
}

function main(args: string[]): void {
  const [command, file, ...rest] = args;
  if (command === undefined || command === "--help" || command === "-h") refuse({ error: "usage", message: USAGE });
  if (!isContractCommand(command)) {
    refuse({ error: "unknown command", message: `unknown command "${command}": use one of ${CONTRACT_COMMANDS.join(", ")}` });
  }
  if (file === undefined || rest.length > 0) refuse({ error: "usage", message: USAGE });
  let json: unknown;
  try {
    json = JSON.parse(readInput(file));
  } catch (error) {
    refuse({ error: "invalid JSON", message: `${file === "-" ? "standard input" : file}: ${(error as Error).message}` });
  }
  const result = runContract(command, json);
  if (!result.ok) refuse({ error: "invalid input", issues: result.errors });
  process.stdout.write(`${JSON.stringify(result.output, null, 2)}\n`);
}

try {
  main(process.argv.slice(2));
} catch (error) {
  refuse({ error: "internal error", message: error instanceof Error ? error.message : String(error) }, 1);
}
