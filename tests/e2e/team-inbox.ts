// The local fakes, from browser tests: the mail inbox and the payment fake's test controls.
import { expect } from '@playwright/test';

interface InboxMail { to: { address: string }[]; text: string }

function required(name: string): string {
  const value = process.env[name];
  if (!value) throw new Error(`${name} is not set: run the browser tests with the local fakes (npm test starts them).`);
  return value;
}

// Waits for the mail to an address and returns the link in it to the given path.
export async function linkFromMail(address: string, path: string): Promise<string> {
  let link = '';
  await expect.poll(async () => {
    const mails = (await (await fetch(`${required('MAIL_INBOX_URL')}/api/email`)).json()) as InboxMail[];
    const mail = mails.filter((entry) => entry.to.some((to) => to.address === address)).pop();
    link = mail?.text.match(new RegExp(`https?://\\S+${path}\\?token=[\\w%-]+`))?.[0] ?? '';
    return link;
  }, { message: `a mail to ${address} with a ${path} link` }).not.toBe('');
  return new URL(link).pathname + new URL(link).search;
}

export async function paymentFake(control: 'hold' | 'release' | 'invoices' | 'fail', body: Record<string, string>): Promise<void> {
  const response = await fetch(`${required('PAYMENTS_FAKE_URL')}/_fake/${control}`, {
    method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body),
  });
  expect(response.ok).toBe(true);
}
