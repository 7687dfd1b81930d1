import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

export interface LocalMailServer {
  smtpPort: number;
  webPort: number;
  stop: () => Promise<void>;
}

/**
 * Starts maildev, the local fake SMTP server with a web inbox, on loopback only. Port 0 picks free ports.
 * Mail is kept in memory and in a temporary folder of its own, removed on stop.
 */
export async function startLocalMailServer(opts: { smtpPort: number; webPort: number }): Promise<LocalMailServer> {
  // maildev is published as an ES module only.
  const { MailDev } = await import('maildev');
  const mailDirectory = fs.mkdtempSync(path.join(os.tmpdir(), 'isoledger-mail-'));
  const maildev = new MailDev({ smtp: opts.smtpPort, web: opts.webPort, ip: '127.0.0.1', webIp: '127.0.0.1', silent: true, mailDirectory });
  const silenced = console.info;
  try {
    // maildev prints its web address even when silent; the caller says where the inbox is instead.
    console.info = () => {};
    const servers = await maildev.start();
    const smtp = servers.smtp.getAddress();
    const web = servers.api?.getAddress();
    return {
      smtpPort: smtp.port,
      webPort: web?.port ?? 0,
      stop: async () => {
        await maildev.stop();
        fs.rmSync(mailDirectory, { recursive: true, force: true });
      },
    };
  } catch (err) {
    await maildev.stop().catch(() => undefined);
    fs.rmSync(mailDirectory, { recursive: true, force: true });
    throw err;
  } finally {
    console.info = silenced;
  }
}
