import { mkdirSync } from 'node:fs';
import { join } from 'node:path';

/**
 * Local stand-ins for hosted services, started by `npm start` and `npm test`:
 * an S3-compatible object store (s3rver) and an SMTP server with a web inbox (maildev).
 * The app talks to them with the real SDKs and protocols, so swapping in S3 and a real SMTP
 * relay is configuration only.
 */
async function main(): Promise<void> {
  const dir = process.env.FAKES_DIR ?? '.data/fakes';
  const s3Port = Number(process.env.S3_PORT ?? 4569);
  const smtpPort = Number(process.env.SMTP_PORT ?? 1025);
  const webPort = Number(process.env.MAIL_WEB_PORT ?? 1080);
  const bucket = process.env.S3_BUCKET ?? 'bandwright';
  mkdirSync(join(dir, 's3'), { recursive: true });
  mkdirSync(join(dir, 'mail'), { recursive: true });

  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const S3rver = require('s3rver');
  const s3 = new S3rver({ port: s3Port, address: '127.0.0.1', directory: join(dir, 's3'), silent: true, configureBuckets: [{ name: bucket }] });
  await s3.run();

  const { MailDev } = await import('maildev');
  const mail = new MailDev({ smtp: smtpPort, ip: '127.0.0.1', web: webPort, webIp: '127.0.0.1', mailDirectory: join(dir, 'mail'), silent: true });
  await mail.start();

  console.log(`object storage (S3 protocol) on http://127.0.0.1:${s3Port}, bucket "${bucket}"`);
  console.log(`SMTP on 127.0.0.1:${smtpPort}; caught mail at http://127.0.0.1:${webPort} (REST: /api/email)`);
  console.log('fakes ready');

  const stop = async () => {
    await Promise.allSettled([mail.stop(), s3.close()]);
    process.exit(0);
  };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}

main().catch((error) => {
  console.error(`local fakes failed to start: ${error instanceof Error ? error.stack : error}`);
  process.exit(1);
});
