import { createIcon } from '@chakra-ui/react';
import { iconStroke as stroke } from '@nappe/web-kit';

// Line icons of our own, drawn on a 24-unit grid with a 1.75 stroke. The spoon of the wordmark
// is drawn in wordmark.tsx: the header, on every page, then loads only that one.

export const ArrowRightIcon = /* @__PURE__ */ createIcon({
  displayName: 'ArrowRightIcon',
  path: <path {...stroke} d="M4.5 12h15M13.5 6l6 6-6 6" />,
});

export const CalendarIcon = /* @__PURE__ */ createIcon({
  displayName: 'CalendarIcon',
  path: [
    <rect key="a" {...stroke} x="3.5" y="5" width="17" height="15.5" rx="2" />,
    <path key="b" {...stroke} d="M3.5 10h17M8 3v4M16 3v4" />,
  ],
});

export const GuestsIcon = /* @__PURE__ */ createIcon({
  displayName: 'GuestsIcon',
  path: [
    <circle key="a" {...stroke} cx="9" cy="8" r="3.5" />,
    <path key="b" {...stroke} d="M2.5 20c.6-3.6 3.2-5.5 6.5-5.5s5.9 1.9 6.5 5.5" />,
    <path key="c" {...stroke} d="M16 4.8a3.3 3.3 0 0 1 0 6.4M18 14.8c1.9.7 3.1 2.4 3.5 5.2" />,
  ],
});

export const CheckIcon = /* @__PURE__ */ createIcon({
  displayName: 'CheckIcon',
  path: <path {...stroke} d="M4.5 12.5l5 5 10-11" />,
});

export const PlateIcon = /* @__PURE__ */ createIcon({
  displayName: 'PlateIcon',
  path: [
    <circle key="a" {...stroke} cx="12" cy="12" r="9" />,
    <circle key="b" {...stroke} cx="12" cy="12" r="5" />,
  ],
});
