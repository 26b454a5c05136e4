/**
 * Entry of the digest helper thread of a rebuild (storage/previous-digests.ts): hashes the previous OUT's
 * framed files and tables while the main thread checks the species files, so that the main thread finds
 * their digests ready instead of reading ~200 MB itself (10,000 species). Each file is hashed by the same
 * `fileDigest` the main thread uses, between two lstat calls; a file whose stamp (device, inode, change
 * time) moved while it was read is not reported. Results go out on the given port in chunks; the main
 * thread takes them synchronously (`receiveMessageOnPort`) when it needs one.
 * With `inputsFirst`, it first waits for the list of species files (the main thread sends it as soon as it
 * has found them) and hashes those, stamped by stat (species files may be links), so that a rebuild's check
 * finds each file's key ready; the previous OUT's files follow.
 */
import { lstatSync, readdirSync, statSync, type StatSyncFn } from 'node:fs';
import path from 'node:path';
import { workerData, type MessagePort } from 'node:worker_threads';
import { fileDigest, stampOf } from '../storage/atomic-write.js';
import { compareText } from '../core/text.js';

export interface DigestWorkerData {
  root: string;
  /** Files (relative to root) hashed first, in this order. */
  first: string[];
  /** Folders (relative to root) whose regular files are hashed next, in name order. */
  folders: string[];
  /** Wait for an `InputsMessage` and hash its files before the previous OUT's. */
  inputsFirst: boolean;
  port: MessagePort;
}

/** The species files to hash first (as the check names them). */
export interface InputsMessage {
  inputs: string[];
}

/** Species files hashed (the main thread keeps them apart from the OUT's files). */
export interface InputRowsMessage {
  inputRows: DigestRow[];
}

/** One file hashed: [absolute path, sha256 hex, bytes, stamp]. */
export type DigestRow = [string, string, number, string];

const { root, first, folders, inputsFirst, port } = workerData as DigestWorkerData;
const CHUNK = 64;
let rows: DigestRow[] = [];
/** While the species files are hashed: their rows go out as an `InputRowsMessage`. */
let hashingInputs = false;

const flush = () => {
  if (rows.length > 0) port.postMessage(hashingInputs ? ({ inputRows: rows } satisfies InputRowsMessage) : rows);
  rows = [];
};

function hashOne(file: string, stat: StatSyncFn = lstatSync): void {
  try {
    const before = stat(file, { bigint: true });
    if (!before.isFile()) return;
    const d = fileDigest(file);
    const after = stat(file, { bigint: true });
    if (stampOf(before) === stampOf(after) && after.size === BigInt(d.bytes)) rows.push([file, d.hash, d.bytes, stampOf(after)]);
  } catch {
    // Gone or unreadable: the main thread finds no digest and looks for itself.
  }
}

if (inputsFirst) {
  const inputs = await new Promise<string[]>((resolve) => port.once('message', (m: InputsMessage) => resolve(m.inputs)));
  hashingInputs = true;
  for (const file of inputs) {
    hashOne(file, statSync);
    if (rows.length >= CHUNK) flush();
  }
  flush();
  hashingInputs = false;
}

for (const rel of first) {
  hashOne(path.join(root, rel));
  flush();
}
for (const folder of folders) {
  let names: string[];
  try {
    names = readdirSync(path.join(root, folder)).sort(compareText);
  } catch {
    continue;
  }
  for (const name of names) {
    hashOne(path.join(root, folder, name));
    if (rows.length >= CHUNK) flush();
  }
  flush();
}
port.postMessage('done');
port.close();
