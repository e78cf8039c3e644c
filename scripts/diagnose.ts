/**
 * `npm run --silent diagnose < case.json`: one case in on stdin, the diagnosis out on stdout as JSON.
 * Bad input goes to stderr as `{ error, issues }` with exit code 2, so stdout only ever holds a result.
 */
import { caseSchema } from "../rules/case";
import { DiagnosisInputError, diagnose } from "../rules/engine";

function fail(error: string, issues: { path: string; message: string }[] = []): never {
  process.stderr.write(`${JSON.stringify({ error, issues }, null, 2)}\n`);
  process.exit(2);
}

async function readStdin(): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks).toString("utf8");
}

const text = await readStdin();
let json: unknown;
try {
  json = JSON.parse(text);
} catch (e) {
  fail(`The input is not JSON: ${(e as Error).message}`);
}
const parsed = caseSchema.safeParse(json);
if (!parsed.success) {
  fail(
    "The case is not valid",
    parsed.error.issues.map((i) => ({ path: i.path.join("."), message: i.message })),
  );
}
try {
  const result = await diagnose(parsed.data);
  process.stdout.write(`${JSON.stringify(result, null, 2)}\n`);
} catch (e) {
  if (e instanceof DiagnosisInputError) fail(e.message, [{ path: "alloy", message: e.message }]);
  throw e;
}
