// The SMTP fake: maildev, with its web inbox and REST API (GET /email) on loopback.
import type { FakeProfile } from './profiles';

export async function startMailFake(profile: FakeProfile): Promise<() => Promise<void>> {
  const { MailDev } = await import('maildev');
  const maildev = new MailDev({ smtp: profile.smtpPort, ip: '127.0.0.1', web: profile.mailWebPort, webIp: '127.0.0.1', silent: true });
  await maildev.start();
  return () => maildev.stop();
}
