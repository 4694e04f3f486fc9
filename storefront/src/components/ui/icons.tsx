import { createIcon } from '@chakra-ui/react';
import { stroke } from './icon-stroke';

// Line icons of our own, drawn on a 24-unit grid with a 1.75 stroke. The spoon of the wordmark
// is drawn in wordmark.tsx: the header, on every page, then loads only that one.

export const EyeIcon = /* @__PURE__ */ createIcon({
  displayName: 'EyeIcon',
  path: [
    <path
      key="a"
      {...stroke}
      d="M2.5 12s3.5-6.5 9.5-6.5S21.5 12 21.5 12 18 18.5 12 18.5 2.5 12 2.5 12Z"
    />,
    <circle key="b" {...stroke} cx="12" cy="12" r="3" />,
  ],
});

export const EyeOffIcon = /* @__PURE__ */ createIcon({
  displayName: 'EyeOffIcon',
  path: [
    <path key="a" {...stroke} d="M4 4l16 16" />,
    <path
      key="b"
      {...stroke}
      d="M9.9 5.8A9.6 9.6 0 0 1 12 5.5c6 0 9.5 6.5 9.5 6.5a17 17 0 0 1-2.7 3.5"
    />,
    <path
      key="c"
      {...stroke}
      d="M6.6 7.7A16.6 16.6 0 0 0 2.5 12s3.5 6.5 9.5 6.5a9 9 0 0 0 4.2-1"
    />,
    <path key="d" {...stroke} d="M10 10a3 3 0 0 0 4 4.1" />,
  ],
});

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
