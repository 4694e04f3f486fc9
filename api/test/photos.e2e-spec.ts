import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { crc32, deflateSync } from 'node:zlib';
import { DEMO_MENUS, DEMO_DESSERTS, DEMO_RECIPES, DEMO_INGREDIENTS, Role } from '@nappe/shared';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemo } from '../src/database/demo-seed.js';
import { catalogueProblems } from '../src/kitchen/catalogue/catalogue-checks.js';
import { KitchenCatalogueService } from '../src/kitchen/catalogue/kitchen-catalogue.service.js';
import { PhotoStorage } from '../src/files/photo-storage.service.js';
import {
  bearer,
  create,
  ingredientBody,
  ingredientLine,
  keyPaths,
  recipeBody,
} from './factories/kitchen.js';
import { createTestApp, makeSignedInUser, type TestApp } from './factories/test-app.js';

let t: TestApp;
let chef: string;
let dessertId: string;
let menuId: string;

/** A real photo-sized JPEG: 1600 × 1200, so the stored variants are 1200 × 900 and 400 × 300. */
let jpeg: Buffer;
let png: Buffer;
let webp: Buffer;

beforeAll(async () => {
  t = await createTestApp();
  chef = (await makeSignedInUser(t, Role.Chef)).token;
  const ingredient = await create(
    t,
    chef,
    '/api/ingredients',
    ingredientBody({ name: 'Cocoa nibs' }),
  );
  const recipe = await create(
    t,
    chef,
    '/api/recipes',
    recipeBody([ingredientLine(ingredient, 100)], {
      name: 'Nib tuile',
      yieldG: 90,
      storage: 'dry',
    }),
  );
  dessertId = await create(t, chef, '/api/desserts', {
    name: 'Nib plate',
    components: [{ recipeId: recipe, quantity: 8, unit: 'g' }],
  });
  menuId = await create(t, chef, '/api/menus', {
    name: 'Nib menu',
    dessertIds: [dessertId],
    pricePerGuestMinor: 800,
    minGuests: 4,
    maxGuests: 30,
    leadDays: 2,
    active: true,
  });
  const picture = sharp({
    create: { width: 1600, height: 1200, channels: 3, background: '#C2813A' },
  });
  jpeg = await picture.clone().jpeg({ quality: 80 }).toBuffer();
  png = await picture.clone().png().toBuffer();
  webp = await picture.clone().webp().toBuffer();
});
afterAll(async () => t.close());

const upload = (path: string, bytes: Buffer, filename: string, token = chef) =>
  t.http.post(path).set(bearer(token)).attach('photo', bytes, filename);

/** A PNG chunk (W3C PNG §5.3): length, type, data, CRC-32 of type and data. */
function pngChunk(type: string, data: Buffer): Buffer {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const typeAndData = Buffer.concat([Buffer.from(type, 'latin1'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(typeAndData) >>> 0);
  return Buffer.concat([length, typeAndData, crc]);
}

/** A tiny, well-formed PNG that claims 50,000 × 50,000 pixels (2.5 gigapixels). */
function pixelBomb(): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(50_000, 0);
  ihdr.writeUInt32BE(50_000, 4);
  ihdr.writeUInt8(8, 8); // bit depth
  ihdr.writeUInt8(0, 9); // greyscale
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    pngChunk('IHDR', ihdr),
    pngChunk('IDAT', deflateSync(Buffer.alloc(1024))),
    pngChunk('IEND', Buffer.alloc(0)),
  ]);
}

/** A JPEG with a comment segment (COM, FF FE; ITU-T T.81 B.2.4.5) right after SOI. */
function jpegWithComment(text: string): Buffer {
  const body = Buffer.from(text, 'latin1');
  const header = Buffer.from([0xff, 0xfe, 0, 0]);
  header.writeUInt16BE(body.length + 2, 2);
  return Buffer.concat([jpeg.subarray(0, 2), header, body, jpeg.subarray(2)]);
}

describe('POST /api/desserts/:id/photo (QUALITY.md Uploads; OWASP File Upload Cheat Sheet)', () => {
  let photoUrl: string;
  let thumbnailUrl: string;
  let photoId: string;

  it('stores a JPEG as WebP variants and serves them with nosniff, a closed CSP and a long cache', async () => {
    const res = await upload(`/api/desserts/${dessertId}/photo`, jpeg, 'plate.JPG').expect(201);
    expect(res.body.photos).toHaveLength(1);
    const [photo] = res.body.photos;
    expect(photo).toMatchObject({ width: 1200, height: 900 });
    expect(photo.url).toMatch(/^\/api\/files\/[0-9a-f-]{36}-1200\.webp$/);
    expect(photo.thumbnailUrl).toMatch(/^\/api\/files\/[0-9a-f-]{36}-400\.webp$/);
    ({ url: photoUrl, thumbnailUrl, id: photoId } = photo);

    const file = await t.http
      .get(photoUrl)
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(file.status).toBe(200);
    expect(file.headers['content-type']).toBe('image/webp');
    expect(file.headers['x-content-type-options']).toBe('nosniff');
    expect(file.headers['content-security-policy']).toMatch(/^default-src 'none'/);
    expect(file.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    // WebP container (RIFF … WEBP), re-encoded: 1200 × 900 and 400 × 300.
    const bytes = file.body as Buffer;
    expect(bytes.toString('latin1', 0, 4)).toBe('RIFF');
    expect(bytes.toString('latin1', 8, 12)).toBe('WEBP');
    expect(await sharp(bytes).metadata()).toMatchObject({
      format: 'webp',
      width: 1200,
      height: 900,
    });
    const thumb = await t.http.get(thumbnailUrl).expect(200);
    expect(thumb.headers['content-type']).toBe('image/webp');
  });

  it('accepts PNG and WebP too, smaller than 1200 px kept at their size', async () => {
    const small = await sharp(png).resize(600).png().toBuffer();
    const res = await upload(`/api/desserts/${dessertId}/photo`, small, 'small.png').expect(201);
    expect(res.body.photos[1]).toMatchObject({ width: 600, height: 450 });
    await upload(`/api/desserts/${dessertId}/photo`, webp, 'plate.webp').expect(201);
  });

  it('refuses a file over 5 MB with 413 and stores nothing', async () => {
    const before = await t.http.get(`/api/desserts/${dessertId}`).set(bearer(chef)).expect(200);
    const big = Buffer.concat([jpeg, Buffer.alloc(5 * 1024 * 1024 + 1 - jpeg.length)]);
    const res = await upload(`/api/desserts/${dessertId}/photo`, big, 'big.jpg');
    expect(res.status).toBe(413);
    expect(res.body.message).toBe('The photo is larger than 5 MB; send a smaller one.');
    const after = await t.http.get(`/api/desserts/${dessertId}`).set(bearer(chef)).expect(200);
    expect(after.body.photos).toEqual(before.body.photos);
  });

  it('refuses SVG with 415, whatever its name', async () => {
    const svg = Buffer.from(
      '<?xml version="1.0"?><svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>',
    );
    const named = await upload(`/api/desserts/${dessertId}/photo`, svg, 'plate.svg').expect(415);
    expect(named.body.message).toMatch(/SVG and other markup files are not accepted/);
    await upload(`/api/desserts/${dessertId}/photo`, svg, 'plate.png').expect(415);
    await upload(`/api/desserts/${dessertId}/photo`, svg, 'plate.jpg').expect(415);
  });

  it('refuses a PNG named .jpg with 415 (the extension must agree with the content)', async () => {
    const res = await upload(`/api/desserts/${dessertId}/photo`, png, 'plate.jpg').expect(415);
    expect(res.body.message).toBe(
      'The file is a PNG image but its name ends in “.jpg”; name it .png.',
    );
    await upload(`/api/desserts/${dessertId}/photo`, jpeg, 'plate').expect(415);
    await upload(`/api/desserts/${dessertId}/photo`, webp, 'plate.jpeg').expect(415);
  });

  it('refuses other image types with 415 (GIF here)', async () => {
    const gif = await sharp(png).resize(64).gif().toBuffer();
    await upload(`/api/desserts/${dessertId}/photo`, gif, 'plate.gif').expect(415);
  });

  it('refuses polyglots: markup in the metadata, or anything after the image (415)', async () => {
    const html = jpegWithComment(
      '<html><body><script>alert(document.cookie)</script></body></html>',
    );
    const inMeta = await upload(`/api/desserts/${dessertId}/photo`, html, 'plate.jpg').expect(415);
    expect(inMeta.body.message).toMatch(/markup in its metadata/);
    const trailing = Buffer.concat([jpeg, Buffer.from('<script>alert(1)</script>')]);
    const after = await upload(`/api/desserts/${dessertId}/photo`, trailing, 'plate.jpg').expect(
      415,
    );
    expect(after.body.message).toMatch(/data after the end of the image/);
    const zip = Buffer.concat([png, Buffer.from('PK\u0003\u0004 an archive follows')]);
    await upload(`/api/desserts/${dessertId}/photo`, zip, 'plate.png').expect(415);
    const riff = Buffer.concat([webp, Buffer.from('<html>')]);
    await upload(`/api/desserts/${dessertId}/photo`, riff, 'plate.webp').expect(415);
    // A plain comment is fine: the stored variants never carry it.
    await upload(
      `/api/desserts/${dessertId}/photo`,
      jpegWithComment('Shot in the studio'),
      'c.jpg',
    ).expect(201);
  });

  it('refuses a pixel bomb before decoding it (413)', async () => {
    const bomb = pixelBomb();
    expect(bomb.length).toBeLessThan(2_000);
    const res = await upload(`/api/desserts/${dessertId}/photo`, bomb, 'bomb.png').expect(413);
    expect(res.body.message).toMatch(/megapixels/);
  });

  it('refuses a truncated image (415)', async () => {
    const cut = jpeg.subarray(0, Math.floor(jpeg.length / 2));
    await upload(`/api/desserts/${dessertId}/photo`, cut, 'cut.jpg').expect(415);
  });

  it('takes multipart on the photo routes only, and one file in the "photo" field', async () => {
    const json = await t.http
      .post(`/api/desserts/${dessertId}/photo`)
      .set(bearer(chef))
      .send({ photo: 'not a file' })
      .expect(415);
    expect(json.body.message).toBe(
      'Send the photo as multipart/form-data, in a field named “photo”.',
    );
    const empty = await t.http
      .post(`/api/desserts/${dessertId}/photo`)
      .set(bearer(chef))
      .expect(400);
    expect(empty.body.message).toEqual([
      'Attach the photo as multipart/form-data in a field named “photo”.',
    ]);
    await t.http
      .post('/api/ingredients')
      .set(bearer(chef))
      .attach('photo', jpeg, 'plate.jpg')
      .expect(415);
    const wrongField = await t.http
      .post(`/api/desserts/${dessertId}/photo`)
      .set(bearer(chef))
      .attach('file', jpeg, 'plate.jpg')
      .expect(400);
    expect(wrongField.body.message).toEqual([
      'Send one photo, in a field named “photo”, and nothing else.',
    ]);
    await t.http
      .post(`/api/desserts/${dessertId}/photo`)
      .set(bearer(chef))
      .attach('photo', jpeg, 'a.jpg')
      .attach('photo', jpeg, 'b.jpg')
      .expect(400);
    await t.http
      .post(`/api/desserts/${dessertId}/photo`)
      .set(bearer(chef))
      .field('name', 'x')
      .expect(400);
  });

  it('is for the chef only (403 for staff and clients) and 404 for an unknown dessert', async () => {
    const staff = await makeSignedInUser(t, Role.Staff);
    const client = await makeSignedInUser(t, Role.Client);
    await upload(`/api/desserts/${dessertId}/photo`, jpeg, 'p.jpg', staff.token).expect(403);
    await upload(`/api/desserts/${dessertId}/photo`, jpeg, 'p.jpg', client.token).expect(403);
    await t.http
      .post(`/api/desserts/${dessertId}/photo`)
      .attach('photo', jpeg, 'p.jpg')
      .expect(401);
    await upload('/api/desserts/00000000-0000-4000-8000-000000000000/photo', jpeg, 'p.jpg').expect(
      404,
    );
  });

  it('serves only names the server made (404 otherwise)', async () => {
    await t.http.get('/api/files/..%2F..%2Fnappe.sqlite').expect(404);
    await t.http.get('/api/files/nappe.sqlite').expect(404);
    await t.http.get('/api/files/00000000-0000-4000-8000-000000000000-1200.webp').expect(404);
    await t.http.get('/api/files/00000000-0000-4000-8000-000000000000-800.webp').expect(404);
  });

  it('removes a photo and its files', async () => {
    await t.http
      .delete(`/api/desserts/${dessertId}/photo/${photoId}`)
      .set(bearer(chef))
      .expect(204);
    await t.http.get(photoUrl).expect(404);
    await t.http.get(thumbnailUrl).expect(404);
    const dessert = await t.http.get(`/api/desserts/${dessertId}`).set(bearer(chef)).expect(200);
    expect(dessert.body.photos.map((p: { id: string }) => p.id)).not.toContain(photoId);
    await t.http
      .delete(`/api/desserts/${dessertId}/photo/${photoId}`)
      .set(bearer(chef))
      .expect(404);
  });
});

describe('POST /api/menus/:id/photo', () => {
  it('adds a photo the public menu shows, never inactive menus', async () => {
    const res = await upload(`/api/menus/${menuId}/photo`, jpeg, 'menu.jpeg').expect(201);
    const [photo] = res.body.photos;
    const pub = await t.http.get(`/api/menus/${menuId}`).expect(200);
    expect(pub.body.photos).toEqual([
      { url: photo.url, thumbnailUrl: photo.thumbnailUrl, width: 1200, height: 900 },
    ]);
    expect(pub.body.desserts[0].photos.length).toBeGreaterThan(0);
    await t.http.get(photo.url).expect(200);
    await upload(`/api/menus/${menuId}/photo`, png, 'menu.jpg').expect(415);
  });

  it('removes the files of a deleted menu', async () => {
    const storage = t.app.get(PhotoStorage);
    const menu = await t.http.get(`/api/menus/admin/${menuId}`).set(bearer(chef)).expect(200);
    const names = (menu.body.photos as Array<{ url: string }>).map((p) => p.url.split('/').pop()!);
    expect(names.every((n) => existsSync(join(storage.dir, n)))).toBe(true);
    await t.http.delete(`/api/menus/${menuId}`).set(bearer(chef)).expect(204);
    expect(names.some((n) => existsSync(join(storage.dir, n)))).toBe(false);
  });
});

describe('demo seed (issue 3: invented catalogue, each dessert with an illustration)', () => {
  let demo: TestApp;
  beforeAll(async () => {
    demo = await createTestApp();
  });
  afterAll(async () => demo.close());

  it('loads the demo catalogue with a rendered illustration per dessert and menu, every menu public', async () => {
    const result = await seedDemo(demo.dataSource, async () => 'not-a-real-hash', 'test');
    expect(result.seeded).toBe(true);
    const loaded = await demo.app.get(KitchenCatalogueService).load();
    expect(loaded.catalogue.ingredients).toHaveLength(DEMO_INGREDIENTS.length);
    expect(loaded.catalogue.recipes).toHaveLength(DEMO_RECIPES.length);
    expect(loaded.catalogue.desserts).toHaveLength(DEMO_DESSERTS.length);
    expect(catalogueProblems(loaded.catalogue)).toEqual([]);

    const res = await demo.http.get('/api/menus').expect(200);
    expect(res.body.items.map((m: { name: string }) => m.name).sort()).toEqual(
      DEMO_MENUS.filter((m) => m.active)
        .map((m) => m.name)
        .sort(),
    );
    expect(DEMO_MENUS.every((m) => m.active)).toBe(true);
    const paths = keyPaths(res.body);
    for (const key of ['url', 'thumbnailUrl', 'width', 'height']) {
      expect(paths).toContain(`items[].photos[].${key}`);
      expect(paths).toContain(`items[].desserts[].photos[].${key}`);
    }
    expect(paths.filter((p) => /cost|price|notes|carriers|ingredient/i.test(p))).toEqual([
      'items[].pricePerGuestMinor',
    ]);
    for (const menu of res.body.items) {
      expect(menu.photos).toHaveLength(1);
      expect(menu.allergens.eu.contains.length).toBeGreaterThan(0);
      for (const dessert of menu.desserts) expect(dessert.photos).toHaveLength(1);
      const file = await demo.http.get(menu.photos[0].url).expect(200);
      expect(file.headers['content-type']).toBe('image/webp');
    }

    const again = await seedDemo(demo.dataSource, async () => 'x', 'test');
    expect(again.seeded).toBe(false);
  });
});
