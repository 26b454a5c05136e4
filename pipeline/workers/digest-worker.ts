/**
 * Entry of the digest helper thread of a rebuild (storage/previous-digests.ts): hashes the previous OUT's
 * framed files and tables while the main thread checks the species files, so that the main thread finds
 * their digests ready instead of reading ~200 MB itself (10,000 species). Each file is hashed by the same
 * `fileDigest` the main thread uses, between two lstat calls; a file whose stamp (device, inode, change
 * time) moved while it was read is not reported. Results go out on the given port in chunks; the main
 * thread takes them synchronously (`receiveMessageOnPort`) when it needs one.
 */
import { lstatSync, readdirSync } from 'node:fs';
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
  port: MessagePort;
}

/** One file hashed: [absolute path, sha256 hex, bytes, stamp]. */
export type DigestRow = [string, string, number, string];

const { root, first, folders, port } = workerData as DigestWorkerData;
const CHUNK = 64;
let rows: DigestRow[] = [];

const flush = () => {
  if (rows.length > 0) port.postMessage(rows);
  rows = [];
};

function hashOne(file: string): void {
  try {
    const before = lstatSync(file, { bigint: true });
    if (!before.isFile()) return;
    const d = fileDigest(file);
    const after = lstatSync(file, { bigint: true });
    if (stampOf(before) === stampOf(after) && after.size === BigInt(d.bytes)) rows.push([file, d.hash, d.bytes, stampOf(after)]);
  } catch {
    // Gone or unreadable: the main thread finds no digest and looks for itself.
  }
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
