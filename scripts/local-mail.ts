import { join } from "node:path";
import { startMailCatcher, type MailCatcher } from "../server/mail/catcher";

/**
 * When no SMTP_URL is configured, starts the local mail catcher (real SMTP on 127.0.0.1, a free
 * port) writing .eml files to MAIL_DIR (default .data/mail), and points SMTP_URL at it.
 */
export async function ensureLocalMail(root: string): Promise<MailCatcher | undefined> {
  if (process.env.SMTP_URL) return undefined;
  process.env.MAIL_DIR ??= join(root, ".data", "mail");
  const catcher = await startMailCatcher({ dir: process.env.MAIL_DIR });
  process.env.SMTP_URL = catcher.url;
  console.log(`Mail catcher is listening on ${catcher.url} (messages in ${catcher.dir}).`);
  return catcher;
}
