/**
 * Reading a record file's text without trusting the file: only a regular file is read (a named
 * pipe or a device would block the check or never end), never more than a record needs (a huge
 * file would parse for minutes), and only as UTF-8 (invalid bytes are reported where they are,
 * not replaced behind the author's back). A byte-order mark is kept, so the text is the file.
 */
import { constants } from 'node:fs';
import { open } from 'node:fs/promises';
import { diagnostic, type Diagnostic } from '../model/index.ts';

/** The largest record file read: records are a few kilobytes; notes are capped well below this. */
export const MAX_RECORD_BYTES = 1024 * 1024;

// Opening without blocking: a named pipe with no writer would otherwise wait forever in open().
const READ_NOW = constants.O_RDONLY | (constants.O_NONBLOCK ?? 0);

/** The file's text, or the one diagnostic that says why it is not read (undefined code: the file cannot be opened). */
export async function readRecordText(path: string): Promise<{ text: string } | { problem: Diagnostic }> {
  const file = { file: path, line: 1, column: 1 };
  const handle = await open(path, READ_NOW).catch((error: NodeJS.ErrnoException) => error);
  if (handle instanceof Error) {
    const message = `the file cannot be read (${handle.code ?? 'unknown error'})`;
    return { problem: diagnostic('record/yaml', 'error', message, { file: path }) };
  }
  try {
    const info = await handle.stat();
    if (!info.isFile()) {
      const kind = info.isDirectory() ? 'a folder' : info.isFIFO() ? 'a named pipe' : 'not a regular file';
      return { problem: diagnostic('record/file', 'error', `this is ${kind}, not a record file`, file) };
    }
    const bytes = Buffer.alloc(Math.min(info.size, MAX_RECORD_BYTES) + 1);
    const { bytesRead } = await handle.read(bytes, 0, bytes.length, 0);
    if (info.size > MAX_RECORD_BYTES || bytesRead > MAX_RECORD_BYTES) {
      const message = `the file holds ${info.size.toLocaleString('en')} bytes; a record is at most ${MAX_RECORD_BYTES.toLocaleString('en')}`;
      const note = 'records are a few kilobytes: is this the right file? Long discussions belong in a linked document';
      return { problem: diagnostic('record/file', 'error', message, { ...file, note }) };
    }
    return decodeUtf8(bytes.subarray(0, bytesRead), path);
  } finally {
    await handle.close();
  }
}

/** The text of UTF-8 bytes, or a `record/file` error at the line and column of the first invalid byte. */
export function decodeUtf8(bytes: Buffer, path: string): { text: string } | { problem: Diagnostic } {
  try {
    return { text: new TextDecoder('utf-8', { fatal: true, ignoreBOM: true }).decode(bytes) };
  } catch {
    // Everything before the first invalid byte survives a lenient round trip unchanged.
    const lenient = Buffer.from(bytes.toString('utf8'), 'utf8');
    let at = 0;
    while (at < bytes.length && bytes[at] === lenient[at]) at += 1;
    const before = bytes.subarray(0, at).toString('utf8');
    const line = before.split('\n').length;
    const column = before.length - before.lastIndexOf('\n');
    const byte = bytes[at] ?? 0;
    const message = `the file is not UTF-8 text: byte 0x${byte.toString(16).padStart(2, '0')} at offset ${at} is not valid here`;
    const note =
      'save the file as UTF-8 (the encoding YAML requires); the byte is not replaced, so nothing is changed silently';
    return { problem: diagnostic('record/file', 'error', message, { file: path, line, column, note }) };
  }
}
