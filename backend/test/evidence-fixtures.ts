import { createHash } from 'node:crypto';
import zlib from 'node:zlib';
import sharp from 'sharp';
import type { anonymous, Agent } from './helpers/test-app.js';

/** Files for the evidence specs, made in the test: photos, documents and disguised programs. */

export const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');

export async function makePng(width = 800, height = 600): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: '#3f7a73' } })
    .png()
    .toBuffer();
}
export async function makeJpeg(width = 1200, height = 900): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: '#c8932a' } })
    .jpeg({ quality: 80 })
    .toBuffer();
}
export async function makeWebp(): Promise<Buffer> {
  return sharp({ create: { width: 400, height: 400, channels: 3, background: '#1d4f4a' } })
    .webp()
    .toBuffer();
}
/** A Linux program's first bytes (ELF header), padded out. */
export function makeElf(): Buffer {
  return Buffer.concat([Buffer.from([0x7f, 0x45, 0x4c, 0x46, 0x02, 0x01, 0x01, 0x00]), Buffer.alloc(4096, 0x90)]);
}
/** A Windows program's first bytes (DOS/PE header "MZ"), padded out. */
export function makePe(): Buffer {
  return Buffer.concat([Buffer.from('MZ\x90\x00\x03\x00\x00\x00', 'latin1'), Buffer.alloc(4096, 0x00)]);
}
/** A small PNG whose header claims 20000 × 13000 pixels: it would unpack into about 780 MB. */
export function makePngBomb(): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
    const len = Buffer.alloc(4);
    len.writeUInt32BE(data.length);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(zlib.crc32(body));
    return Buffer.concat([len, body, crc]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(20000, 0);
  ihdr.writeUInt32BE(13000, 4);
  ihdr.set([8, 2, 0, 0, 0], 8);
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return Buffer.concat([
    signature,
    chunk('IHDR', ihdr),
    chunk('IDAT', zlib.deflateSync(Buffer.alloc(60_000))),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}
export const PDF = Buffer.from(
  '%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n',
  'latin1',
);
export const CSV = Buffer.from('station_mm,reading_mm\n0,0.000\n250,0.012\n500,-0.004\n', 'utf8');

/** A GET whose body is kept as raw bytes, whatever its content type. */
export function download(agent: Agent, url: string) {
  return agent
    .get(url)
    .buffer(true)
    .parse((res, cb) => {
      const chunks: Buffer[] = [];
      res.on('data', (d: Buffer) => chunks.push(d));
      res.on('end', () => cb(null, Buffer.concat(chunks)));
    });
}

/** Field order as a browser's FormData sends it: fields first, then the file. */
export function upload(
  agent: Agent | ReturnType<typeof anonymous>,
  fields: Record<string, string>,
  file?: { body: Buffer; name: string; type?: string },
) {
  let req = agent.post('/api/evidence');
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  if (file)
    req = req.attach('file', file.body, { filename: file.name, contentType: file.type ?? 'application/octet-stream' });
  return req;
}
