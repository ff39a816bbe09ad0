/**
 * A command-line entry that reads one JSON request on stdin, calls `handle`
 * and prints its JSON result on stdout (exit 0). Bad input, malformed JSON
 * included, prints one line naming the field on stderr and exits 2; anything
 * else is a fault of the program and exits 1.
 */
import { EngineInputError } from "../../src/lib/antenna/problems";

async function readStdin(): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks).toString("utf8");
}

function oneLine(text: string): string {
  return text.replace(/\s+/g, " ").trim();
}

export async function runJsonCli(handle: (request: unknown) => unknown): Promise<void> {
  const text = await readStdin();
  let request: unknown;
  try {
    request = JSON.parse(text);
  } catch (error) {
    process.stderr.write(`request: malformed JSON (${oneLine(error instanceof Error ? error.message : String(error))})\n`);
    process.exitCode = 2;
    return;
  }
  try {
    process.stdout.write(`${JSON.stringify(handle(request))}\n`);
  } catch (error) {
    if (error instanceof EngineInputError) {
      process.stderr.write(`${oneLine(error.problems.join("; "))}\n`);
      process.exitCode = 2;
      return;
    }
    throw error;
  }
}
