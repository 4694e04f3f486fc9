import { extname } from 'node:path';

/**
 * Decides what an uploaded photo is from its bytes, never from its name or the type the client
 * declares (OWASP File Upload Cheat Sheet: "validate the file type, don't trust the
 * Content-Type header"; QUALITY.md Uploads). Accepts JPEG, PNG and WebP only, requires the file
 * name's extension to agree, and walks the container so that nothing hides around the image:
 *
 * - JPEG (ITU-T T.81 Annex B): SOI, marker segments, entropy-coded scans, EOI. After EOI only
 *   padding or further complete JPEGs (multi-picture and gain-map images that phones append)
 *   are allowed.
 * - PNG (W3C PNG 3rd ed. §5): signature, IHDR first, chunks up to IEND, and nothing after it.
 * - WebP (RIFF container, Google's WebP Container Specification): the RIFF size is the file size.
 *
 * Metadata (JPEG APPn/COM segments, PNG ancillary chunks, WebP EXIF/XMP/ICC chunks) is searched
 * for markup a browser would run or render (`<script`, `<svg`, `<html`…): an image that is also
 * an HTML or SVG document (a polyglot) is refused. The stored files are re-encoded from pixels in
 * any case, so nothing of the upload but its pixels is ever served.
 */

export type ImageFormat = 'jpeg' | 'png' | 'webp';

export const IMAGE_MIME: Record<ImageFormat, string> = {
  jpeg: 'image/jpeg',
  png: 'image/png',
  webp: 'image/webp',
};

const EXTENSIONS: Record<ImageFormat, readonly string[]> = {
  jpeg: ['.jpg', '.jpeg'],
  png: ['.png'],
  webp: ['.webp'],
};

const FORMAT_LABEL: Record<ImageFormat, string> = { jpeg: 'JPEG', png: 'PNG', webp: 'WebP' };

/** A refused upload: 415 for what it is, 413 for how big it is. */
export class ImageRejectedError extends Error {
  constructor(
    readonly status: 413 | 415,
    message: string,
  ) {
    super(message);
    this.name = 'ImageRejectedError';
  }
}

const ACCEPTED = 'Send a JPEG, PNG or WebP photo.';

const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

/** The format the bytes start with, or null. */
export function sniffImageFormat(bytes: Buffer): ImageFormat | null {
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) {
    return 'jpeg';
  }
  if (bytes.length >= 8 && bytes.subarray(0, 8).equals(PNG_SIGNATURE)) return 'png';
  if (
    bytes.length >= 12 &&
    bytes.toString('latin1', 0, 4) === 'RIFF' &&
    bytes.toString('latin1', 8, 12) === 'WEBP'
  ) {
    return 'webp';
  }
  return null;
}

/** Markup a browser would render or run, searched for in metadata and trailing data. */
const MARKUP = [
  '<script',
  '<svg',
  '<html',
  '<body',
  '<iframe',
  '<object',
  '<embed',
  '<!doctype',
  '<?php',
  'javascript:',
];

function hasMarkup(bytes: Buffer): boolean {
  const text = bytes.toString('latin1').toLowerCase();
  return MARKUP.some((token) => text.includes(token));
}

function looksLikeMarkup(bytes: Buffer): boolean {
  const head = bytes
    .subarray(0, 512)
    .toString('utf8')
    .replace(/^\uFEFF/, '')
    .trimStart();
  return head.startsWith('<');
}

const polyglot = (where: string) =>
  new ImageRejectedError(
    415,
    `The photo carries something besides the image (${where}). ${ACCEPTED}`,
  );
const damaged = (format: ImageFormat, detail: string) =>
  new ImageRejectedError(
    415,
    `The ${FORMAT_LABEL[format]} file is damaged: ${detail}. ${ACCEPTED}`,
  );

// ---------------------------------------------------------------- JPEG

const JPEG_MAX_NESTED = 4;

/** Walks one JPEG from its SOI; returns the offset just after its EOI. */
function walkJpeg(bytes: Buffer, start: number): number {
  let pos = start + 2; // after SOI (FF D8)
  for (;;) {
    if (pos >= bytes.length) throw damaged('jpeg', 'it ends before the end-of-image marker');
    if (bytes[pos] !== 0xff) throw damaged('jpeg', `no marker at byte ${pos}`);
    while (bytes[pos] === 0xff) pos += 1; // fill bytes (T.81 B.1.1.2)
    const marker = bytes[pos];
    pos += 1;
    if (marker === undefined) throw damaged('jpeg', 'it ends inside a marker');
    if (marker === 0xd9) return pos; // EOI
    if ((marker >= 0xd0 && marker <= 0xd7) || marker === 0x01) continue; // RSTn, TEM: no length
    if (marker === 0xd8 || marker === 0x00)
      throw damaged('jpeg', `unexpected marker at byte ${pos}`);
    if (pos + 2 > bytes.length) throw damaged('jpeg', 'it ends inside a segment');
    const length = bytes.readUInt16BE(pos);
    if (length < 2 || pos + length > bytes.length) {
      throw damaged('jpeg', `a segment at byte ${pos} runs past the end`);
    }
    const isMetadata = (marker >= 0xe0 && marker <= 0xef) || marker === 0xfe; // APPn, COM
    if (isMetadata && hasMarkup(bytes.subarray(pos + 2, pos + length))) {
      throw polyglot('markup in its metadata');
    }
    pos += length;
    if (marker === 0xda) {
      // Entropy-coded data: 0xFF is always followed by 0x00 (stuffing) or RSTn, until a marker.
      while (pos < bytes.length) {
        if (bytes[pos] === 0xff) {
          const next = bytes[pos + 1];
          if (next === 0x00 || (next !== undefined && next >= 0xd0 && next <= 0xd7)) {
            pos += 2;
            continue;
          }
          break;
        }
        pos += 1;
      }
    }
  }
}

function checkJpeg(bytes: Buffer): void {
  let start = 0;
  for (let images = 0; ; images += 1) {
    const end = walkJpeg(bytes, start);
    let next = end;
    while (next < bytes.length && (bytes[next] === 0x00 || bytes[next] === 0xff)) {
      // Padding, unless it is the start of another JPEG.
      if (bytes[next] === 0xff && bytes[next + 1] === 0xd8) break;
      next += 1;
    }
    if (next >= bytes.length) return;
    const appended = bytes[next] === 0xff && bytes[next + 1] === 0xd8 && bytes[next + 2] === 0xff;
    if (!appended || images + 1 >= JPEG_MAX_NESTED) {
      throw polyglot('data after the end of the image');
    }
    start = next;
  }
}

// ---------------------------------------------------------------- PNG

const PNG_IMAGE_CHUNKS = new Set(['IDAT', 'fdAT']);

function checkPng(bytes: Buffer): void {
  let pos = 8;
  let first = true;
  for (;;) {
    if (pos + 12 > bytes.length) throw damaged('png', 'it ends before the IEND chunk');
    const length = bytes.readUInt32BE(pos);
    const type = bytes.toString('latin1', pos + 4, pos + 8);
    const dataStart = pos + 8;
    const end = dataStart + length + 4; // + CRC
    if (end > bytes.length) throw damaged('png', `the ${type} chunk runs past the end`);
    if (first && type !== 'IHDR') throw damaged('png', 'the first chunk is not IHDR');
    first = false;
    if (!PNG_IMAGE_CHUNKS.has(type) && hasMarkup(bytes.subarray(dataStart, dataStart + length))) {
      throw polyglot('markup in its metadata');
    }
    pos = end;
    if (type === 'IEND') {
      if (pos !== bytes.length) throw polyglot('data after the end of the image');
      return;
    }
  }
}

// ---------------------------------------------------------------- WebP

const WEBP_IMAGE_CHUNKS = new Set(['VP8 ', 'VP8L', 'ALPH', 'ANMF']);

function checkWebp(bytes: Buffer): void {
  const riffSize = bytes.readUInt32LE(4);
  if (riffSize + 8 < bytes.length) throw polyglot('data after the end of the image');
  if (riffSize + 8 > bytes.length) throw damaged('webp', 'it is shorter than its header says');
  let pos = 12;
  while (pos < bytes.length) {
    if (pos + 8 > bytes.length) throw damaged('webp', 'it ends inside a chunk header');
    const type = bytes.toString('latin1', pos, pos + 4);
    const size = bytes.readUInt32LE(pos + 4);
    const dataStart = pos + 8;
    const end = dataStart + size + (size % 2);
    if (end > bytes.length) throw damaged('webp', `the ${type.trim()} chunk runs past the end`);
    if (!WEBP_IMAGE_CHUNKS.has(type) && hasMarkup(bytes.subarray(dataStart, dataStart + size))) {
      throw polyglot('markup in its metadata');
    }
    pos = end;
  }
}

// ---------------------------------------------------------------- the whole check

/**
 * The format of an uploaded photo, after checking its bytes, its structure and that its file name
 * agrees. Throws ImageRejectedError (415) otherwise.
 */
export function checkUploadedImage(bytes: Buffer, originalName: string): ImageFormat {
  const format = sniffImageFormat(bytes);
  if (!format) {
    if (looksLikeMarkup(bytes)) {
      throw new ImageRejectedError(415, `SVG and other markup files are not accepted. ${ACCEPTED}`);
    }
    throw new ImageRejectedError(415, `This file is not a photo we accept. ${ACCEPTED}`);
  }
  const extension = extname(originalName).toLowerCase();
  if (!EXTENSIONS[format].includes(extension)) {
    throw new ImageRejectedError(
      415,
      `The file is a ${FORMAT_LABEL[format]} image but its name ends in “${extension || '(nothing)'}”; name it ${EXTENSIONS[format].join(' or ')}.`,
    );
  }
  switch (format) {
    case 'jpeg':
      checkJpeg(bytes);
      break;
    case 'png':
      checkPng(bytes);
      break;
    case 'webp':
      checkWebp(bytes);
      break;
  }
  return format;
}
