/**
 * The choices of the settings form's two long selects, from the browser's own Intl data: every
 * IANA time zone it knows (grouped by region) and every ISO 4217 currency with its name.
 */

export interface ZoneGroup {
  region: string;
  zones: Array<{ value: string; label: string }>;
}

function supported(kind: 'timeZone' | 'currency'): string[] {
  try {
    return Intl.supportedValuesOf(kind);
  } catch {
    return [];
  }
}

/** "America/Argentina/Buenos_Aires" → "Argentina / Buenos Aires". */
function placeName(zone: string): string {
  const rest = zone.includes('/') ? zone.slice(zone.indexOf('/') + 1) : zone;
  return rest.replace(/_/g, ' ').replace(/\//g, ' / ');
}

/** Zones by region ("Europe", "America"…), with `current` always present even if Intl lacks it. */
export function timeZoneGroups(current: string): ZoneGroup[] {
  const zones = new Set(supported('timeZone'));
  zones.add(current);
  const groups = new Map<string, ZoneGroup['zones']>();
  for (const zone of [...zones].sort()) {
    const region = zone.includes('/') ? zone.slice(0, zone.indexOf('/')) : 'Other';
    const list = groups.get(region) ?? [];
    list.push({ value: zone, label: `${placeName(zone)} (${zone})` });
    groups.set(region, list);
  }
  return [...groups.entries()]
    .sort(([a], [b]) => a.localeCompare(b))
    .map(([region, list]) => ({ region, zones: list }));
}

/** "EUR — Euro", for every currency Intl knows, `current` included. */
export function currencyOptions(current: string): Array<{ value: string; label: string }> {
  const codes = new Set(supported('currency'));
  codes.add(current);
  let names: Intl.DisplayNames | null = null;
  try {
    names = new Intl.DisplayNames(['en-GB'], { type: 'currency' });
  } catch {
    names = null;
  }
  return [...codes].sort().map((code) => {
    const name = names?.of(code);
    return { value: code, label: name && name !== code ? `${code} — ${name}` : code };
  });
}
