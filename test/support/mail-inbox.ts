import { startLocalMailServer, type LocalMailServer } from '@/scripts/lib/maildev';

/** A message as maildev's REST API returns it (the fields the tests read). */
export interface ReceivedMail {
  id: string;
  subject: string;
  text?: string;
  html?: string;
  to: { address: string; name?: string }[];
  from: { address: string; name?: string }[];
}

/**
 * A fake SMTP server on loopback for one test file, read through maildev's REST API. `stop()` and `start()`
 * again keep the same ports, to stand for a mail server that goes down and comes back.
 */
export class MailInbox {
  private server: LocalMailServer | null = null;
  smtpPort = 0;
  webPort = 0;

  async start(): Promise<this> {
    this.server = await startLocalMailServer({ smtpPort: this.smtpPort, webPort: this.webPort });
    this.smtpPort = this.server.smtpPort;
    this.webPort = this.server.webPort;
    return this;
  }

  async stop() {
    await this.server?.stop();
    this.server = null;
  }

  async all(): Promise<ReceivedMail[]> {
    const res = await fetch(`http://127.0.0.1:${this.webPort}/api/email`);
    if (!res.ok) throw new Error(`maildev answered ${res.status}`);
    return (await res.json()) as ReceivedMail[];
  }

  async to(address: string): Promise<ReceivedMail[]> {
    return (await this.all()).filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()));
  }

  async clear() {
    await fetch(`http://127.0.0.1:${this.webPort}/api/email/all`, { method: 'DELETE' });
  }
}
