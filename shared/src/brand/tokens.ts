/**
 * Nappe's palette. The anchors come from the design card: aubergine ink #2B1E2F (ink.900),
 * cream paper #FBF6EE (cream.100), pistachio #8FA36B (pistachio.500), caramel #C2813A
 * (caramel.500), berry for alerts #A3324A (berry.600). The other steps are ours, spaced so
 * that text/background pairs can be picked for WCAG AA (see semantic-tokens.ts and its test).
 */
export const palette = {
  ink: {
    50: '#F7F3F7',
    100: '#EDE5EE',
    200: '#DACCDC',
    300: '#BFA9C2',
    400: '#9C819F',
    500: '#7A5F7E',
    600: '#5E4762',
    700: '#48344B',
    800: '#38283B',
    900: '#2B1E2F',
    950: '#1C131F',
  },
  cream: {
    50: '#FFFCF7',
    100: '#FBF6EE',
    200: '#F5ECDD',
    300: '#ECDFC9',
    400: '#DFCCAE',
    500: '#CBB38E',
    600: '#A88F6B',
    700: '#7F6A4D',
    800: '#574834',
    900: '#3A3023',
    950: '#241D15',
  },
  pistachio: {
    50: '#F4F7EE',
    100: '#E6EDDA',
    200: '#CFDCB8',
    300: '#B5C792',
    400: '#A0B47C',
    500: '#8FA36B',
    600: '#748853',
    700: '#5A6B40',
    800: '#445132',
    900: '#323C25',
    950: '#1F2617',
  },
  caramel: {
    50: '#FCF4EA',
    100: '#F8E5CE',
    200: '#F0CB9F',
    300: '#E4AE6E',
    400: '#D4964F',
    500: '#C2813A',
    600: '#A3692B',
    700: '#825222',
    800: '#623E1B',
    900: '#452C14',
    950: '#2C1C0C',
  },
  berry: {
    50: '#FBEEF0',
    100: '#F5D7DC',
    200: '#EAAFB9',
    300: '#DC8294',
    400: '#C95670',
    500: '#B63F59',
    600: '#A3324A',
    700: '#85283C',
    800: '#661F2E',
    900: '#4A1722',
    950: '#2F0E15',
  },
  /** A warm grey between ink and cream; replaces Chakra's cool grey so default parts match. */
  gray: {
    50: '#FAF7F4',
    100: '#F2EDE8',
    200: '#E4DCD6',
    300: '#CFC4C0',
    400: '#A89AA0',
    500: '#85767E',
    600: '#685A63',
    700: '#52454E',
    800: '#3B3039',
    900: '#271D28',
    950: '#181119',
  },
} as const;

export type PaletteName = keyof typeof palette;
export type Step = keyof (typeof palette)['ink'];

function scale(name: PaletteName) {
  return Object.fromEntries(
    Object.entries(palette[name]).map(([step, hex]) => [step, { value: hex }]),
  );
}

/** Design tokens in Chakra's token format (`{ value }`): plain data both apps' themes take. */
export const tokens = {
  colors: {
    ink: scale('ink'),
    cream: scale('cream'),
    pistachio: scale('pistachio'),
    caramel: scale('caramel'),
    berry: scale('berry'),
    gray: scale('gray'),
  },
  fonts: {
    heading: { value: "'Playfair Display', Georgia, 'Times New Roman', serif" },
    body: { value: "Inter, system-ui, -apple-system, 'Segoe UI', Roboto, sans-serif" },
  },
  radii: {
    l1: { value: '0.25rem' },
    l2: { value: '0.5rem' },
    l3: { value: '0.75rem' },
  },
};
