import { readdir, readFile } from "node:fs/promises";
import { join } from "node:path";
import { simpleParser } from "mailparser";
import type { CaughtMessage } from "../../lib/people-schemas";
import { env } from "../env";

/** The caught messages of the local mail catcher (MAIL_DIR), newest first, for the development inbox. */
export async function caughtMessages(limit = 50): Promise<CaughtMessage[]> {
  const names = (await readdir(env.MAIL_DIR).catch(() => [] as string[]))
    .filter((n) => n.endsWith(".eml"))
    .sort()
    .reverse()
    .slice(0, limit);
  // A name caughtMessage will not read (not a plain .eml name) is left out rather than sent as null.
  const messages = await Promise.all(names.map((name) => caughtMessage(name)));
  return messages.filter((m) => m !== undefined);
}

/** One message by its file name; only plain .eml names inside the folder are read. */
export async function caughtMessage(name: string): Promise<CaughtMessage | undefined> {
  if (!/^[\w.-]+\.eml$/.test(name)) return undefined;
  const raw = await readFile(join(env.MAIL_DIR, name)).catch(() => undefined);
  if (!raw) return undefined;
  const mail = await simpleParser(raw);
  const to = [mail.to].flat().flatMap((a) => a?.value.map((v) => v.address ?? "") ?? []);
  const text = (mail.text ?? "").trim();
  return {
    id: name,
    to,
    subject: mail.subject ?? "(no subject)",
    date: (mail.date ?? new Date(0)).toISOString(),
    text,
    links: [...new Set(text.match(/https?:\/\/[^\s<>"]+/g) ?? [])],
  };
}
