/**
 * Just enough of the ZIP format (PKWARE APPNOTE 6.3: end of central directory, central
 * directory headers, local headers; stored or deflated entries) to look inside a .docx.
 */
import { inflateRawSync } from 'node:zlib';

export interface ZipEntry {
  name: string;
  read(): Buffer;
}

export function readZip(data: Buffer): ZipEntry[] {
  if (data.readUInt32LE(0) !== 0x04034b50) throw new Error('Not a ZIP file: no local file header signature (PK\\3\\4) at the start');
  let eocd = -1;
  for (let i = data.length - 22; i >= Math.max(0, data.length - 22 - 0xffff); i -= 1) {
    if (data.readUInt32LE(i) === 0x06054b50) {
      eocd = i;
      break;
    }
  }
  if (eocd < 0) throw new Error('Not a ZIP file: no end of central directory record');
  const count = data.readUInt16LE(eocd + 10);
  let at = data.readUInt32LE(eocd + 16);
  const entries: ZipEntry[] = [];
  for (let n = 0; n < count; n += 1) {
    if (data.readUInt32LE(at) !== 0x02014b50) throw new Error(`Bad central directory header at ${at}`);
    const method = data.readUInt16LE(at + 10);
    const compressedSize = data.readUInt32LE(at + 20);
    const nameLength = data.readUInt16LE(at + 28);
    const extraLength = data.readUInt16LE(at + 30);
    const commentLength = data.readUInt16LE(at + 32);
    const localOffset = data.readUInt32LE(at + 42);
    const name = data.subarray(at + 46, at + 46 + nameLength).toString('utf8');
    entries.push({
      name,
      read() {
        const localNameLength = data.readUInt16LE(localOffset + 26);
        const localExtraLength = data.readUInt16LE(localOffset + 28);
        const start = localOffset + 30 + localNameLength + localExtraLength;
        const raw = data.subarray(start, start + compressedSize);
        if (method === 0) return Buffer.from(raw);
        if (method === 8) return inflateRawSync(raw);
        throw new Error(`${name}: compression method ${method} is not supported here`);
      },
    });
    at += 46 + nameLength + extraLength + commentLength;
  }
  return entries;
}

export function zipText(data: Buffer, name: string): string {
  const entry = readZip(data).find((e) => e.name === name);
  if (!entry) throw new Error(`${name} is not in the ZIP (it has ${readZip(data).map((e) => e.name).join(', ')})`);
  return entry.read().toString('utf8');
}
