import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { simpleParser, type ParsedMail } from "mailparser";
import { inject } from "vitest";

const mailDir = inject("mailDir");

/** Every message the catcher received for `to`, oldest first, parsed from its .eml file. */
export async function mailTo(to: string): Promise<ParsedMail[]> {
  const names = readdirSync(mailDir)
    .filter((n) => n.endsWith(".eml"))
    .sort();
  const found: ParsedMail[] = [];
  for (const name of names) {
    const parsed = await simpleParser(readFileSync(join(mailDir, name)));
    const addresses = [parsed.to].flat().flatMap((a) => a?.value ?? []);
    if (addresses.some((a) => a.address?.toLowerCase() === to.toLowerCase())) found.push(parsed);
  }
  return found;
}

/** Waits (up to 10 s) until `count` messages for `to` have arrived through SMTP, then returns them. */
export async function waitForMail(to: string, count = 1): Promise<ParsedMail[]> {
  for (let waited = 0; ; waited += 100) {
    const found = await mailTo(to);
    if (found.length >= count) return found;
    if (waited > 10000) throw new Error(`expected ${count} message(s) to ${to}, found ${found.length}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** The first link to the app in a message's plain text. */
export function linkIn(mail: ParsedMail): URL {
  const match = mail.text?.match(/https?:\/\/\S+/);
  if (!match) throw new Error(`no link in "${mail.subject}"`);
  return new URL(match[0]);
}
