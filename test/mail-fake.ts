// The local mail fake for the test suites: maildev 3 on loopback (SMTP and its REST API on
// free ports), and helpers that read what was sent through maildev's API (/api/email).
import { MailDev } from 'maildev';
import { createServer } from 'node:net';

export interface MailFakeAddress {
  smtpUrl: string;
  apiUrl: string;
}

export interface FakeMail {
  id: string;
  subject: string;
  text: string;
  to: { address: string }[];
  time: string;
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

export async function startMailFake(): Promise<MailFakeAddress & { stop: () => Promise<void> }> {
  const [smtp, web] = [await freePort(), await freePort()];
  const maildev = new MailDev({ smtp, web, ip: '127.0.0.1', webIp: '127.0.0.1', silent: true });
  await maildev.start();
  return { smtpUrl: `smtp://127.0.0.1:${smtp}`, apiUrl: `http://127.0.0.1:${web}`, stop: () => maildev.stop() };
}

/** Every message maildev holds for the address, oldest first. */
export async function mailsTo(apiUrl: string, address: string): Promise<FakeMail[]> {
  const res = await fetch(`${apiUrl}/api/email`);
  if (!res.ok) throw new Error(`maildev answered ${res.status}`);
  const all = (await res.json()) as FakeMail[];
  return all.filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()));
}

/** Waits (polling maildev) until the address has `count` messages; returns them. */
export async function waitForMails(apiUrl: string, address: string, count = 1, timeoutMs = 20_000): Promise<FakeMail[]> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const mails = await mailsTo(apiUrl, address);
    if (mails.length >= count) return mails;
    if (Date.now() > until) throw new Error(`${address} received ${mails.length} of ${count} expected messages within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

/** The one-time link in a message's text. */
export function linkIn(mail: FakeMail): string {
  const match = /https?:\/\/\S+\/set-password#token=[\w.-]+/.exec(mail.text);
  if (!match) throw new Error(`no set-password link in "${mail.subject}"`);
  return match[0];
}

export const tokenOf = (link: string): string => decodeURIComponent(link.split('#token=')[1]!);
