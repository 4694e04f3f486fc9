import { createIcon } from '@chakra-ui/react';
import { iconStroke as stroke } from '@nappe/web-kit';

// Line icons of our own on the app's 24-unit grid, 1.75 stroke (see components/ui/icons.tsx).

/** A snowflake of three crossed strokes with small barbs: frozen storage. */
export const FrozenIcon = /* @__PURE__ */ createIcon({
  displayName: 'FrozenIcon',
  path: [
    <path key="a" {...stroke} d="M12 3v18M4.2 7.5l15.6 9M4.2 16.5l15.6-9" />,
    <path key="b" {...stroke} d="M9.8 4.6 12 6.3l2.2-1.7M9.8 19.4 12 17.7l2.2 1.7" />,
  ],
});

/** A clock face with a notch at the hour: a time that cannot be met. */
export const ClockIcon = /* @__PURE__ */ createIcon({
  displayName: 'ClockIcon',
  path: [
    <circle key="a" {...stroke} cx="12" cy="12.5" r="8" />,
    <path key="b" {...stroke} d="M12 8v4.5l3 2M9.5 2.5h5" />,
  ],
});

/** A small tag with a hole and string: a component label. */
export const TagIcon = /* @__PURE__ */ createIcon({
  displayName: 'TagIcon',
  path: [
    <path key="a" {...stroke} d="M3.5 11.2V4.5a1 1 0 0 1 1-1h6.7l9.3 9.3-7.7 7.7z" />,
    <circle key="b" {...stroke} cx="8" cy="8" r="1.5" />,
  ],
});
