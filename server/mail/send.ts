import nodemailer, { type Transporter } from "nodemailer";
import { env } from "../env";

export type Mail = { to: string; subject: string; text: string; html: string };

/** Waits before each further attempt: with the default 1 s, a mail server briefly away gets 15 s to come back. */
const retryDelaysMs = () => [1, 4, 10].map((x) => x * env.MAIL_RETRY_MS);
let transport: Transporter | undefined;
const inFlight = new Set<Promise<boolean>>();

function transporter(): Transporter {
  if (!env.SMTP_URL) throw new Error("SMTP_URL is not set (npm start and npm run dev start a local mail catcher).");
  transport ??= nodemailer.createTransport(env.SMTP_URL);
  return transport;
}

/**
 * Sends in the background and never throws: the change that asked for the message (an invitation,
 * a reset) is already saved and stays valid, so a lost message can be asked for again. Each failure
 * is logged; after the last attempt the message is given up with a log line saying so.
 */
export function sendMail(mail: Mail): Promise<boolean> {
  const job = deliver(mail).finally(() => inFlight.delete(job));
  inFlight.add(job);
  return job;
}

async function deliver(mail: Mail): Promise<boolean> {
  for (let attempt = 0; ; attempt++) {
    try {
      await transporter().sendMail({ from: env.MAIL_FROM, ...mail });
      return true;
    } catch (err) {
      const delay = retryDelaysMs()[attempt];
      const what = `mail "${mail.subject}" to ${mail.to}`;
      if (delay === undefined) {
        console.error(`Gave up on ${what} after ${attempt + 1} attempts: ${(err as Error).message}`);
        return false;
      }
      console.warn(`Could not send ${what} (attempt ${attempt + 1}): ${(err as Error).message}; retrying.`);
      await new Promise((r) => setTimeout(r, delay));
    }
  }
}

/** Resolves when every message handed to sendMail has been sent or given up (for shutdown and tests). */
export async function mailSettled(): Promise<void> {
  await Promise.all([...inFlight]);
}
