// Local stand-in for the mail server: an SMTP server that keeps every message and a page to read
// them (maildev), both on loopback. Ports and the mail folder come from the environment
// (scripts/start.sh and scripts/test.sh give `npm start` and `npm test` different ones).
import fs from 'node:fs';
import path from 'node:path';
import { MailDev } from 'maildev';

const smtp = Number(process.env.RUNNEL_SMTP_PORT ?? 2525);
const web = Number(process.env.RUNNEL_MAIL_WEB_PORT ?? 1080);
const mailDirectory = path.resolve(process.env.RUNNEL_MAIL_DIR ?? '.runtime/mail');

fs.mkdirSync(mailDirectory, { recursive: true });
const server = new MailDev({ smtp, ip: '127.0.0.1', web, webIp: '127.0.0.1', mailDirectory, silent: true });
await server.start();
console.log(`[fake mail] SMTP 127.0.0.1:${smtp}, read the mail at http://127.0.0.1:${web}`);

const stop = () => server.stop().finally(() => process.exit(0));
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
