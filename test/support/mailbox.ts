/** Reads the local fake SMTP server's inbox (maildev REST API), as a person would read their mail. */
export const MAIL_WEB_URL = process.env.MAIL_WEB_URL ?? `http://127.0.0.1:${process.env.MAIL_WEB_PORT ?? 1081}`;

export interface CaughtMail {
  id: string;
  subject: string;
  text: string;
  to: { address: string }[];
  time: string;
}

export async function mailTo(address: string): Promise<CaughtMail[]> {
  const response = await fetch(`${MAIL_WEB_URL}/api/email`);
  if (!response.ok) throw new Error(`mail inbox answered ${response.status}`);
  const all = (await response.json()) as CaughtMail[];
  return all.filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()));
}

/** Waits for the newest message to an address whose subject matches, and returns it. */
export async function waitForMail(address: string, subject: RegExp, timeoutMs = 10000): Promise<CaughtMail> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const found = (await mailTo(address)).filter((m) => subject.test(m.subject));
    if (found.length) return found[found.length - 1];
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`no mail to ${address} matching ${subject} within ${timeoutMs} ms`);
}

export function linkIn(mail: CaughtMail, path: string): string {
  const match = mail.text.match(new RegExp(`https?://\\S+${path.replace(/[/?]/g, '\\$&')}\\S*`));
  if (!match) throw new Error(`no ${path} link in "${mail.subject}"`);
  return match[0];
}
