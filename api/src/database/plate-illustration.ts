import { createHash } from 'node:crypto';

/**
 * Invented plate illustrations for the demo catalogue (there are no photographs here): an SVG
 * composed in code — a plate seen from above, a quenelle, a line of crumble, a few dots of
 * sauce — in our palette, laid out from a hash of the dish's name so every dish looks its own.
 * The seed renders it to WebP with sharp; the SVG itself is never served.
 */

export const PALETTE = {
  aubergine: '#2B1E2F',
  cream: '#FBF6EE',
  pistachio: '#8FA36B',
  caramel: '#C2813A',
  berry: '#A3324A',
} as const;

const WIDTH = 1200;
const HEIGHT = 900;

/** A small deterministic generator (mulberry32) seeded from the name. */
function randomFrom(seedText: string): () => number {
  let seed = createHash('sha256').update(seedText).digest().readUInt32LE(0);
  return () => {
    seed = (seed + 0x6d2b79f5) >>> 0;
    let t = seed;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const round = (v: number) => Math.round(v * 10) / 10;

/** The quenelle's colour from what the dish is named after; berry when nothing matches. */
function accentFor(name: string): string {
  const n = name.toLowerCase();
  if (n.includes('pistachio') || n.includes('herb') || n.includes('matcha'))
    return PALETTE.pistachio;
  if (n.includes('vanilla') || n.includes('cream') || n.includes('cloud')) return PALETTE.cream;
  if (n.includes('caramel') || n.includes('hazelnut') || n.includes('rum')) return PALETTE.caramel;
  return PALETTE.berry;
}

/** One plate centred at (cx, cy) with radius r: rim, well, crumble line, quenelle, sauce dots. */
function plate(cx: number, cy: number, r: number, name: string, random: () => number): string {
  const accent = accentFor(name);
  const parts: string[] = [];
  parts.push(
    `<circle cx="${cx}" cy="${cy + r * 0.04}" r="${r}" fill="${PALETTE.aubergine}" opacity="0.12"/>`,
    `<circle cx="${cx}" cy="${cy}" r="${r}" fill="#FFFFFF" stroke="${PALETTE.aubergine}" stroke-opacity="0.18" stroke-width="${round(r * 0.012)}"/>`,
    `<circle cx="${cx}" cy="${cy}" r="${round(r * 0.68)}" fill="${PALETTE.cream}" stroke="${PALETTE.aubergine}" stroke-opacity="0.08" stroke-width="${round(r * 0.01)}"/>`,
  );

  // A crumble line: a band of irregular crumbs along a gentle arc under the quenelle.
  const tilt = (random() - 0.5) * 0.35;
  const crumbs = 44 + Math.floor(random() * 14);
  for (let i = 0; i < crumbs; i += 1) {
    const t = random();
    const x = cx - r * 0.46 + t * r * 0.92;
    const y =
      cy +
      r * 0.3 -
      Math.sin(t * Math.PI) * r * 0.06 +
      (x - cx) * tilt +
      (random() - 0.5) * r * 0.07;
    const size = r * (0.014 + random() * 0.022);
    const dark = random() > 0.78;
    parts.push(
      `<ellipse cx="${round(x)}" cy="${round(y)}" rx="${round(size)}" ry="${round(size * (0.65 + random() * 0.4))}" transform="rotate(${Math.floor(random() * 180)} ${round(x)} ${round(y)})" fill="${dark ? PALETTE.aubergine : PALETTE.caramel}" opacity="${dark ? 0.3 : 0.92}"/>`,
    );
  }

  // A brushstroke of sauce across one side of the well.
  const sauce = random() > 0.5 ? PALETTE.berry : PALETTE.pistachio;
  const side = random() > 0.5 ? 1 : -1;
  parts.push(
    `<path d="M ${round(cx + side * r * 0.18)} ${round(cy - r * 0.42)} Q ${round(cx + side * r * 0.55)} ${round(cy - r * 0.2)} ${round(cx + side * r * 0.5)} ${round(cy + r * 0.12)}" fill="none" stroke="${sauce}" stroke-opacity="0.55" stroke-linecap="round" stroke-width="${round(r * 0.035)}"/>`,
  );

  // A quenelle resting on the crumble: a tapered oval with a soft highlight and a shadow.
  const qx = cx + (random() - 0.5) * r * 0.2;
  const qy = cy + r * 0.06;
  const angle = -18 + random() * 36;
  const qw = r * 0.36;
  const qh = r * 0.16;
  const outline = accent === PALETTE.cream ? PALETTE.caramel : PALETTE.aubergine;
  parts.push(
    `<g transform="rotate(${round(angle)} ${round(qx)} ${round(qy)})">`,
    `<ellipse cx="${round(qx + qw * 0.06)}" cy="${round(qy + qh * 0.35)}" rx="${round(qw)}" ry="${round(qh * 0.8)}" fill="${PALETTE.aubergine}" opacity="0.15"/>`,
    `<path d="M ${round(qx - qw)} ${round(qy)} C ${round(qx - qw * 0.6)} ${round(qy - qh * 1.1)}, ${round(qx + qw * 0.7)} ${round(qy - qh * 1.05)}, ${round(qx + qw)} ${round(qy)} C ${round(qx + qw * 0.7)} ${round(qy + qh * 1.05)}, ${round(qx - qw * 0.6)} ${round(qy + qh * 1.1)}, ${round(qx - qw)} ${round(qy)} Z" fill="${accent}" stroke="${outline}" stroke-opacity="0.25" stroke-width="${round(r * 0.008)}"/>`,
    `<path d="M ${round(qx - qw * 0.7)} ${round(qy - qh * 0.25)} C ${round(qx - qw * 0.3)} ${round(qy - qh * 0.8)}, ${round(qx + qw * 0.35)} ${round(qy - qh * 0.75)}, ${round(qx + qw * 0.6)} ${round(qy - qh * 0.3)}" fill="none" stroke="#FFFFFF" stroke-opacity="0.55" stroke-linecap="round" stroke-width="${round(r * 0.025)}"/>`,
    `</g>`,
  );

  // Dots of sauce in a falling arc across the top of the well, largest first.
  const dots = 4 + Math.floor(random() * 3);
  const start = side > 0 ? Math.PI * (1.08 + random() * 0.1) : Math.PI * (1.62 + random() * 0.1);
  for (let i = 0; i < dots; i += 1) {
    const a = start + side * i * 0.2;
    const x = cx + Math.cos(a) * r * 0.5;
    const y = cy + Math.sin(a) * r * 0.5;
    const size = r * (0.045 - i * 0.006);
    parts.push(
      `<circle cx="${round(x)}" cy="${round(y)}" r="${round(Math.max(size, r * 0.012))}" fill="${sauce}"/>`,
    );
  }

  // A shard standing up from the quenelle (chocolate or tuile), sometimes.
  if (random() > 0.35) {
    const sx = qx + qw * 0.2;
    const sy = qy - qh * 0.6;
    parts.push(
      `<path d="M ${round(sx)} ${round(sy)} L ${round(sx + r * 0.12)} ${round(sy - r * 0.32)} L ${round(sx + r * 0.2)} ${round(sy - r * 0.28)} L ${round(sx + r * 0.06)} ${round(sy + r * 0.02)} Z" fill="${PALETTE.cream}" stroke="${PALETTE.caramel}" stroke-width="${round(r * 0.01)}" opacity="0.95"/>`,
    );
  }
  return parts.join('');
}

/** The linen under the plates: cream with pistachio stripes, for menus. */
function linen(random: () => number): string {
  const stripes: string[] = [];
  const gap = 120 + Math.floor(random() * 60);
  for (let x = -HEIGHT; x < WIDTH; x += gap) {
    stripes.push(
      `<rect x="${x}" y="-100" width="14" height="${HEIGHT + 200}" fill="${PALETTE.pistachio}" opacity="0.14" transform="rotate(12 ${x} 0)"/>`,
    );
  }
  return stripes.join('');
}

function frame(body: string): string {
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${WIDTH}" height="${HEIGHT}" viewBox="0 0 ${WIDTH} ${HEIGHT}"><rect width="${WIDTH}" height="${HEIGHT}" fill="${PALETTE.cream}"/>${body}</svg>`;
}

/** One plated dessert, seen from above. */
export function dessertIllustration(name: string): string {
  const random = randomFrom(`dessert:${name}`);
  const backdrop = `<rect x="0" y="${HEIGHT * 0.82}" width="${WIDTH}" height="${HEIGHT * 0.18}" fill="${PALETTE.aubergine}" opacity="0.06"/>`;
  return frame(backdrop + plate(WIDTH / 2, HEIGHT / 2, 380, name, random));
}

/** A menu: its desserts' plates side by side on striped linen (up to three shown). */
export function menuIllustration(menuName: string, dessertNames: readonly string[]): string {
  const random = randomFrom(`menu:${menuName}`);
  const shown = dessertNames.slice(0, 3);
  const count = Math.max(shown.length, 1);
  const r = count === 1 ? 360 : count === 2 ? 250 : 178;
  const spacing = 2 * r + 36;
  const plates = (shown.length > 0 ? shown : [menuName])
    .map((name, i) => {
      const cx = WIDTH / 2 + (i - (count - 1) / 2) * spacing;
      const cy = HEIGHT / 2 + (count > 1 ? (i % 2 === 0 ? -24 : 36) : 0);
      return plate(round(cx), cy, r, name, random);
    })
    .join('');
  return frame(linen(random) + plates);
}
