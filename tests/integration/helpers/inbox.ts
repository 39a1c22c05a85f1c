// Reads the local mail fake's inbox (maildev's REST API under MAIL_INBOX_URL).
interface InboxMail { to: { address: string }[]; subject: string; text: string; date: string }

export async function mailsTo(address: string): Promise<InboxMail[]> {
  const base = process.env.MAIL_INBOX_URL;
  if (!base) throw new Error('MAIL_INBOX_URL is not set: run the tests with the local fakes (npm test starts them).');
  const response = await fetch(`${base}/api/email`);
  const mails = (await response.json()) as InboxMail[];
  return mails.filter((mail) => mail.to.some((to) => to.address.toLowerCase() === address.toLowerCase()));
}

// The last mail to an address; the SMTP hand-over has finished once sendMail resolved.
export async function lastLinkTo(address: string, path: string): Promise<string> {
  const mails = await mailsTo(address);
  const mail = mails[mails.length - 1];
  if (!mail) throw new Error(`no mail to ${address}`);
  const match = mail.text.match(new RegExp(`https?://\\S+${path}\\?token=([\\w%-]+)`));
  if (!match) throw new Error(`no ${path} link in the mail to ${address}`);
  return decodeURIComponent(match[1]);
}
