import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { beforeAll, describe, expect, it } from 'vitest';
import { checkUploadedImage, ImageRejectedError, sniffImageFormat } from './image-check.js';

let jpeg: Buffer;
let png: Buffer;
let webp: Buffer;
let gif: Buffer;
let tiff: Buffer;

beforeAll(async () => {
  const picture = sharp({ create: { width: 64, height: 48, channels: 3, background: '#8FA36B' } });
  jpeg = await picture.clone().jpeg().toBuffer();
  png = await picture.clone().png().toBuffer();
  webp = await picture.clone().webp().toBuffer();
  gif = await picture.clone().gif().toBuffer();
  tiff = await picture.clone().tiff().toBuffer();
});

const rejected = (bytes: Buffer, name: string): ImageRejectedError => {
  try {
    checkUploadedImage(bytes, name);
  } catch (error) {
    if (error instanceof ImageRejectedError) return error;
    throw error;
  }
  throw new Error(`${name} was accepted`);
};

/** A JPEG marker segment (ITU-T T.81 B.1.1.4): FF, marker, 2-byte length including itself, data. */
function segment(marker: number, text: string): Buffer {
  const data = Buffer.from(text, 'latin1');
  const head = Buffer.from([0xff, marker, 0, 0]);
  head.writeUInt16BE(data.length + 2, 2);
  return Buffer.concat([head, data]);
}
const afterSoi = (image: Buffer, inserted: Buffer) =>
  Buffer.concat([image.subarray(0, 2), inserted, image.subarray(2)]);

describe('sniffImageFormat agrees with the signatures and with the file-type library', () => {
  it('reads JPEG (T.81 SOI FF D8 + marker), PNG (W3C PNG §5.2) and WebP (RIFF … WEBP)', async () => {
    expect(sniffImageFormat(jpeg)).toBe('jpeg');
    expect(sniffImageFormat(png)).toBe('png');
    expect(sniffImageFormat(webp)).toBe('webp');
    // Cross-check with a general-purpose detector (file-type, as installed with @nestjs/common).
    expect((await fileTypeFromBuffer(jpeg))?.mime).toBe('image/jpeg');
    expect((await fileTypeFromBuffer(png))?.mime).toBe('image/png');
    expect((await fileTypeFromBuffer(webp))?.mime).toBe('image/webp');
  });

  it('does not take GIF, TIFF, SVG or text for a photo, as file-type does not take them for ours', async () => {
    const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"/>');
    for (const other of [gif, tiff, svg, Buffer.from('hello')]) {
      expect(sniffImageFormat(other)).toBeNull();
      expect(['image/jpeg', 'image/png', 'image/webp']).not.toContain(
        (await fileTypeFromBuffer(other))?.mime,
      );
    }
  });
});

describe('checkUploadedImage', () => {
  it('accepts the three formats with an agreeing extension, in any case', () => {
    expect(checkUploadedImage(jpeg, 'a.jpg')).toBe('jpeg');
    expect(checkUploadedImage(jpeg, 'A.JPEG')).toBe('jpeg');
    expect(checkUploadedImage(png, 'a.Png')).toBe('png');
    expect(checkUploadedImage(webp, 'a.webp')).toBe('webp');
  });

  it('refuses an extension that disagrees, or none (415)', () => {
    expect(rejected(png, 'a.jpg')).toMatchObject({ status: 415 });
    expect(rejected(jpeg, 'a.png').message).toMatch(/JPEG image but its name ends in “\.png”/);
    expect(rejected(webp, 'noextension').message).toMatch(/ends in “\(nothing\)”/);
  });

  it('names SVG and markup, and refuses other types', () => {
    const svg = Buffer.from('\uFEFF  <?xml version="1.0"?><svg/>');
    expect(rejected(svg, 'a.svg').message).toMatch(/^SVG and other markup files are not accepted/);
    expect(rejected(gif, 'a.gif').message).toMatch(/^This file is not a photo we accept/);
  });

  describe('JPEG structure (ITU-T T.81 Annex B)', () => {
    it('accepts metadata segments without markup, XMP included', () => {
      const xmp = segment(
        0xe1,
        'http://ns.adobe.com/xap/1.0/\0<?xpacket begin=""?><x:xmpmeta xmlns:x="adobe:ns:meta/"></x:xmpmeta>',
      );
      expect(checkUploadedImage(afterSoi(jpeg, xmp), 'a.jpg')).toBe('jpeg');
      expect(checkUploadedImage(afterSoi(jpeg, segment(0xfe, 'a comment')), 'a.jpg')).toBe('jpeg');
    });

    it('refuses markup in an APPn or COM segment', () => {
      for (const marker of [0xe0, 0xe1, 0xfe]) {
        const bad = afterSoi(jpeg, segment(marker, 'x<SCRIPT>alert(1)</script>'));
        expect(rejected(bad, 'a.jpg').message).toMatch(/markup in its metadata/);
      }
      expect(rejected(afterSoi(jpeg, segment(0xfe, '<!DOCTYPE html>')), 'a.jpg').status).toBe(415);
    });

    it('allows padding and further JPEGs after EOI (multi-picture and gain-map images), nothing else', () => {
      expect(checkUploadedImage(Buffer.concat([jpeg, Buffer.alloc(16)]), 'a.jpg')).toBe('jpeg');
      expect(checkUploadedImage(Buffer.concat([jpeg, jpeg]), 'a.jpg')).toBe('jpeg');
      expect(
        rejected(Buffer.concat([jpeg, Buffer.from('PK\x03\x04zip')]), 'a.jpg').message,
      ).toMatch(/data after the end of the image/);
      const hiddenInSecond = Buffer.concat([jpeg, afterSoi(jpeg, segment(0xfe, '<svg onload=x>'))]);
      expect(rejected(hiddenInSecond, 'a.jpg').message).toMatch(/markup/);
    });

    it('refuses a truncated file or a segment that runs past the end', () => {
      expect(rejected(jpeg.subarray(0, jpeg.length - 2), 'a.jpg').message).toMatch(/damaged/);
      expect(rejected(Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0xff, 0xff]), 'a.jpg').message).toMatch(
        /runs past the end/,
      );
    });
  });

  describe('PNG structure (W3C PNG §5)', () => {
    it('refuses anything after IEND', () => {
      expect(rejected(Buffer.concat([png, Buffer.from([0])]), 'a.png').message).toMatch(
        /data after the end of the image/,
      );
    });

    it('refuses markup in an ancillary chunk and a first chunk other than IHDR', () => {
      const iend = png.length - 12;
      const text = Buffer.from('Comment\0<html><script>x</script>', 'latin1');
      const len = Buffer.alloc(4);
      len.writeUInt32BE(text.length);
      const chunk = Buffer.concat([len, Buffer.from('tEXt'), text, Buffer.alloc(4)]);
      const withText = Buffer.concat([png.subarray(0, iend), chunk, png.subarray(iend)]);
      expect(rejected(withText, 'a.png').message).toMatch(/markup in its metadata/);
      const swapped = Buffer.concat([png.subarray(0, 8), chunk, png.subarray(8)]);
      expect(rejected(swapped, 'a.png').message).toMatch(/first chunk is not IHDR/);
    });
  });

  describe('WebP structure (RIFF)', () => {
    it('refuses a file longer or shorter than its RIFF size', () => {
      expect(rejected(Buffer.concat([webp, Buffer.from('tail')]), 'a.webp').message).toMatch(
        /data after the end/,
      );
      expect(rejected(webp.subarray(0, webp.length - 4), 'a.webp').message).toMatch(/shorter/);
    });

    it('refuses markup in a metadata chunk', () => {
      const data = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"/>');
      const head = Buffer.alloc(8);
      head.write('XMP ', 0, 'latin1');
      head.writeUInt32LE(data.length, 4);
      const chunk = Buffer.concat([
        head,
        data,
        data.length % 2 ? Buffer.alloc(1) : Buffer.alloc(0),
      ]);
      const bytes = Buffer.concat([webp, chunk]);
      bytes.writeUInt32LE(bytes.length - 8, 4);
      expect(rejected(bytes, 'a.webp').message).toMatch(/markup in its metadata/);
    });
  });
});
