// Local fakes for outside services (mail, file storage, payments), on loopback only:
//   tsx scripts/fakes.ts env <app|test>   prints `export NAME=value` lines for the shell
//   tsx scripts/fakes.ts run <app|test>   runs every fake until stopped
import { startMailFake } from './fakes/mail';
import { startPaymentsFake } from './fakes/payments';
import { environmentFor, PROFILES } from './fakes/profiles';
import { startStorageFake } from './fakes/storage';

async function main(command: string | undefined, profileName: string | undefined): Promise<void> {
  if (profileName !== 'app' && profileName !== 'test') throw new Error('profile must be app or test');
  const profile = PROFILES[profileName];
  if (command === 'env') {
    for (const [name, value] of Object.entries(environmentFor(profile))) console.log(`export ${name}='${value}'`);
    return;
  }
  if (command !== 'run') throw new Error('command must be env or run');
  const stops = [await startMailFake(profile), await startStorageFake(profile), await startPaymentsFake(profile)];
  console.log(`fakes ready: SMTP 127.0.0.1:${profile.smtpPort}, inbox http://127.0.0.1:${profile.mailWebPort}, S3 http://127.0.0.1:${profile.s3Port}, payments http://127.0.0.1:${profile.paymentsPort}`);
  const stop = async () => { await Promise.allSettled(stops.map((fn) => fn())); process.exit(0); };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}

main(process.argv[2], process.argv[3]).catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
