// Integration tests talk to the test cluster `npm test` starts (scripts/test.sh sets these).
import fs from 'node:fs';

// Run by hand, the tests sign in with the password the scripts generated (.secrets/pg-password).
const passwordFile = '.secrets/pg-password';
const password = fs.existsSync(passwordFile) ? `:${fs.readFileSync(passwordFile, 'utf8').trim()}` : '';
process.env.DATABASE_URL ??= `postgres://runnel${password}@127.0.0.1:5489/runnel_test`;
process.env.NEXTAUTH_URL ??= 'http://127.0.0.1:3100';
// The fake object storage `npm test` starts (scripts/test.sh).
process.env.RUNNEL_S3_ENDPOINT ??= 'http://127.0.0.1:9402';
