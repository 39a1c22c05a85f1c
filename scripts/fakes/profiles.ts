// Ports and folders of the local fakes that stand in for outside services, one profile for
// `npm start` (app) and one for `npm test` (test) so both can run side by side.
import path from 'node:path';

export interface FakeProfile {
  smtpPort: number;
  mailWebPort: number;
  s3Port: number;
  s3Directory: string;
  paymentsPort: number;
  paymentsStateFile: string;
  appPort: number; // where the payment fake sends its webhooks
}

const ROOT = path.resolve(__dirname, '..', '..');
// Moves every fake's port, for running a second checkout beside this one (default 0).
const OFFSET = Number(process.env.ANTINODE_FAKE_PORT_OFFSET ?? 0);

export const PROFILES: Record<'app' | 'test', FakeProfile> = {
  app: {
    smtpPort: 1025 + OFFSET, mailWebPort: 1080 + OFFSET, s3Port: 4569 + OFFSET, s3Directory: path.join(ROOT, '.data', 's3'),
    paymentsPort: 12111 + OFFSET, paymentsStateFile: path.join(ROOT, '.data', 'payments-app.json'), appPort: Number(process.env.PORT ?? 3000),
  },
  test: {
    smtpPort: 1026 + OFFSET, mailWebPort: 1081 + OFFSET, s3Port: 4570 + OFFSET, s3Directory: path.join(ROOT, '.data', 's3-test'),
    paymentsPort: 12112 + OFFSET, paymentsStateFile: path.join(ROOT, '.data', 'payments-test.json'), appPort: Number(process.env.ANTINODE_E2E_PORT ?? 3100),
  },
};

export const S3_BUCKET = 'antinode-uploads';
// s3rver accepts this fixed key pair; it guards nothing, as the fake listens on loopback only.
export const S3_FAKE_KEY = 'S3RVER';
// Likewise the payment fake's API key and webhook signing secret: fixed, loopback only.
export const PAYMENTS_FAKE_KEY = 'sk_test_antinode_local_fake';
export const PAYMENTS_FAKE_WEBHOOK_SECRET = 'whsec_antinode_local_fake';

// The environment the app reads (lib/config.ts) for a profile.
export function environmentFor(profile: FakeProfile): Record<string, string> {
  return {
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(profile.smtpPort),
    MAIL_INBOX_URL: `http://127.0.0.1:${profile.mailWebPort}`,
    S3_ENDPOINT: `http://127.0.0.1:${profile.s3Port}`,
    S3_REGION: 'us-east-1',
    S3_BUCKET,
    S3_ACCESS_KEY_ID: S3_FAKE_KEY,
    S3_SECRET_ACCESS_KEY: S3_FAKE_KEY,
    STRIPE_SECRET_KEY: PAYMENTS_FAKE_KEY,
    STRIPE_API_HOST: '127.0.0.1',
    STRIPE_API_PORT: String(profile.paymentsPort),
    STRIPE_API_PROTOCOL: 'http',
    STRIPE_WEBHOOK_SECRET: PAYMENTS_FAKE_WEBHOOK_SECRET,
    PAYMENTS_FAKE_URL: `http://127.0.0.1:${profile.paymentsPort}`,
    PAYMENTS_WEBHOOK_URL: process.env.PAYMENTS_WEBHOOK_URL ?? `http://127.0.0.1:${profile.appPort}/api/v1/billing/webhook`,
  };
}
