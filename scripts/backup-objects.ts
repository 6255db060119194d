// The object-storage half of `npm run backup` / `npm run restore`, through the app's own storage
// module (lib/storage.ts), so it works with the local fake and any S3-compatible service alike.
//   save <folder>           every object of the bucket into <folder>/objects/, listed in objects.json
//   load <folder> <journal> makes the bucket hold exactly the backup's objects; first checks the whole
//                           backup, then saves into <journal> what it will replace or remove, and on
//                           any failure puts the bucket back as it was
//   undo <journal>          puts the bucket back as it was before `load` (restore.sh runs it when the
//                           database half fails after the objects were restored)
// Exit status 1: failed, the bucket as it was; 3: failed and the bucket could not be put back.
// Every failure names the step, the object and the store, and says what state it left.
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { z } from 'zod';
import { env } from '../lib/env';
import { deleteObject, getObject, listKeys, putObject } from '../lib/storage';

const ManifestEntry = z.strictObject({
  key: z.string().min(1).max(1024),
  // Only the names `save` writes: a manifest cannot point outside its folder.
  file: z.string().regex(/^\d{6}\.bin$/),
  contentType: z.string().min(1).max(255),
  bytes: z.number().int().nonnegative(),
  sha256: z.string().regex(/^[0-9a-f]{64}$/),
});
type ManifestEntry = z.infer<typeof ManifestEntry>;
const Manifest = z.array(ManifestEntry);

/** What `load` changes, written before it changes anything: enough to put the bucket back. */
const Journal = z.strictObject({
  /** Objects as they were before the restore (to be replaced or removed), saved under the journal. */
  before: z.array(ManifestEntry),
  /** Keys the restore adds, which did not exist before it. */
  added: z.array(z.string()),
});
type Journal = z.infer<typeof Journal>;

const sha256 = (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex');
const store = () => `bucket ${env().RUNNEL_S3_BUCKET} at ${env().RUNNEL_S3_ENDPOINT}`;

/** A failure of one step, worded for the operator: what was being done, to which object, and why. */
class StepError extends Error {}
/** The bucket is neither as it was nor as the backup has it (exit status 3: the journal must be kept). */
class NotPutBackError extends StepError {}

function reason(error: unknown): string {
  // lib/storage.ts words a failing store for the app's users; the cause says what really happened.
  const parts: string[] = [];
  for (let e: unknown = error; e instanceof Error && parts.length < 4; e = e.cause) parts.push(e.message || e.name);
  return parts.length > 1 ? parts.slice(1).join(': ') : (parts[0] ?? String(error));
}

async function step<T>(what: string, run: () => Promise<T>): Promise<T> {
  try {
    return await run();
  } catch (error) {
    if (error instanceof StepError) throw error;
    throw new StepError(`${what} in the ${store()} failed: ${reason(error)}`);
  }
}

function readManifest(file: string): ManifestEntry[] {
  if (!fs.existsSync(file)) throw new StepError(`${file} is missing: not a Runnel backup folder`);
  let raw: unknown;
  try {
    raw = JSON.parse(fs.readFileSync(file, 'utf8'));
  } catch (error) {
    throw new StepError(`${file} is not readable JSON (${(error as Error).message})`);
  }
  const parsed = Manifest.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    throw new StepError(`${file} is damaged at ${issue.path.join('.') || 'the top'}: ${issue.message}`);
  }
  return parsed.data;
}

/** The bytes of one saved object, checked against its manifest entry. */
function savedBytes(dir: string, entry: ManifestEntry, where: string): Buffer {
  const file = path.join(dir, entry.file);
  if (!fs.existsSync(file)) throw new StepError(`${where}/${entry.file} (object ${entry.key}) is missing`);
  const bytes = fs.readFileSync(file);
  if (sha256(bytes) !== entry.sha256)
    throw new StepError(`${where}/${entry.file} (object ${entry.key}) does not match its checksum`);
  return bytes;
}

/** Some S3-compatible stores answer a read of a key deleted after the listing with a server error,
 *  not "no such key": a read that fails is skipped only when the key is gone from a new listing. */
async function readIfStillThere(key: string): ReturnType<typeof getObject> {
  try {
    return await getObject(key);
  } catch (error) {
    const still = await step(`listing the bucket again after reading object ${key} failed`, () => listKeys(key));
    if (!still.includes(key)) return null;
    throw new StepError(`reading object ${key} from the ${store()} failed: ${reason(error)}`);
  }
}

async function save(folder: string): Promise<void> {
  const dir = path.join(folder, 'objects');
  fs.mkdirSync(dir, { recursive: true, mode: 0o700 });
  const entries: ManifestEntry[] = [];
  for (const key of await step('listing the bucket', () => listKeys(''))) {
    const object = await readIfStillThere(key);
    // Deleted between the listing and the read: a live store changes while it is copied.
    if (!object) continue;
    const file = `${String(entries.length + 1).padStart(6, '0')}.bin`;
    fs.writeFileSync(path.join(dir, file), object.bytes, { mode: 0o600 });
    entries.push({
      key,
      file,
      contentType: object.contentType,
      bytes: object.bytes.byteLength,
      sha256: sha256(object.bytes),
    });
  }
  fs.writeFileSync(path.join(folder, 'objects.json'), `${JSON.stringify(entries, null, 1)}\n`, { mode: 0o600 });
  console.log(`[runnel] ${entries.length} objects saved`);
}

/** Puts the bucket back as the journal says it was. Every step is tried; the first failure is thrown after. */
async function undo(journalDir: string): Promise<void> {
  const journal = Journal.parse(JSON.parse(fs.readFileSync(path.join(journalDir, 'journal.json'), 'utf8')));
  const failures: string[] = [];
  for (const entry of journal.before) {
    try {
      const bytes = savedBytes(journalDir, entry, journalDir);
      await step(`putting object ${entry.key} back`, () => putObject(entry.key, bytes, entry.contentType));
    } catch (error) {
      failures.push((error as Error).message);
    }
  }
  for (const key of journal.added) {
    try {
      await step(`removing object ${key}, which the restore added`, () => deleteObject(key));
    } catch (error) {
      failures.push((error as Error).message);
    }
  }
  if (failures.length > 0) {
    throw new NotPutBackError(
      `${failures.length} object(s) could not be put back (first: ${failures[0]}); the objects as they were are kept in ${journalDir}`,
    );
  }
}

async function load(folder: string, journalDir: string): Promise<void> {
  // 1. The whole backup is checked before anything is touched.
  const entries = readManifest(path.join(folder, 'objects.json'));
  const backupDir = path.join(folder, 'objects');
  const where = `${folder}/objects`;
  // Checked one file at a time (a bucket can be larger than memory), read again when written.
  for (const entry of entries) savedBytes(backupDir, entry, where);
  const incoming = new Map(entries.map((entry) => [entry.key, entry]));

  // 2. What the restore will replace or remove is saved first, and the plan written down.
  const current = new Set(await step('listing the bucket', () => listKeys('')));
  const journal: Journal = { before: [], added: [] };
  const toPut: string[] = [];
  const toRemove: string[] = [];
  for (const key of new Set([...current, ...incoming.keys()])) {
    const now = current.has(key) ? await readIfStillThere(key) : null;
    const wanted = incoming.get(key);
    if (now && wanted && sha256(now.bytes) === wanted.sha256 && now.contentType === wanted.contentType) continue;
    if (now) {
      const file = `${String(journal.before.length + 1).padStart(6, '0')}.bin`;
      fs.writeFileSync(path.join(journalDir, file), now.bytes, { mode: 0o600 });
      journal.before.push({
        key,
        file,
        contentType: now.contentType,
        bytes: now.bytes.byteLength,
        sha256: sha256(now.bytes),
      });
    } else if (wanted) {
      journal.added.push(key);
    }
    (wanted ? toPut : toRemove).push(key);
  }
  fs.writeFileSync(path.join(journalDir, 'journal.json'), JSON.stringify(journal), { mode: 0o600 });

  // 3. The changes; any failure puts back what was changed.
  try {
    for (const key of toPut) {
      const entry = incoming.get(key)!;
      const bytes = savedBytes(backupDir, entry, where);
      await step(`writing object ${key}`, () => putObject(key, bytes, entry.contentType));
    }
    for (const key of toRemove)
      await step(`removing object ${key}, which is not in the backup`, () => deleteObject(key));
  } catch (error) {
    try {
      await undo(journalDir);
    } catch (undoError) {
      throw new NotPutBackError(
        `${(error as Error).message}; putting the bucket back failed too: ${(undoError as Error).message}`,
      );
    }
    throw new StepError(`${(error as Error).message}; the bucket was put back as it was`);
  }
  console.log(
    `[runnel] ${entries.length} objects in the backup: ${toPut.length} written, ${toRemove.length} not in the backup removed`,
  );
}

const [command, first, second] = process.argv.slice(2);
const run =
  command === 'save' && first
    ? () => save(first)
    : command === 'load' && first && second
      ? () => load(first, second)
      : command === 'undo' && first
        ? () => undo(first)
        : null;
if (!run) {
  console.error(
    'usage: backup-objects.ts save <backup folder> | load <backup folder> <journal folder> | undo <journal folder>',
  );
  process.exit(2);
}
run().catch((error) => {
  console.error(`[runnel] object storage: ${error instanceof StepError ? error.message : reason(error)}`);
  process.exit(error instanceof NotPutBackError ? 3 : 1);
});
