import { createIcon } from '@chakra-ui/react';
import { iconStroke as stroke } from '@nappe/web-kit';

/*
 * Line icons of our own for the booking screens, on the same 24-unit grid and 1.75 stroke as
 * icons.tsx. A separate module from icons.tsx (which the entry loads for the header), so that
 * these travel with the lazy screens that use them. Each is decorative: text always goes with it.
 */

export const ChevronLeftIcon = /* @__PURE__ */ createIcon({
  displayName: 'ChevronLeftIcon',
  path: <path {...stroke} d="M14.5 5.5 8 12l6.5 6.5" />,
});

export const ChevronRightIcon = /* @__PURE__ */ createIcon({
  displayName: 'ChevronRightIcon',
  path: <path {...stroke} d="M9.5 5.5 16 12l-6.5 6.5" />,
});

export const ArrowLeftIcon = /* @__PURE__ */ createIcon({
  displayName: 'ArrowLeftIcon',
  path: <path {...stroke} d="M19.5 12h-15M10.5 6l-6 6 6 6" />,
});

export const PlusIcon = /* @__PURE__ */ createIcon({
  displayName: 'PlusIcon',
  path: <path {...stroke} d="M12 5v14M5 12h14" />,
});

export const TrashIcon = /* @__PURE__ */ createIcon({
  displayName: 'TrashIcon',
  path: [
    <path key="a" {...stroke} d="M4.5 7h15M9.5 7V4.5h5V7" />,
    <path
      key="b"
      {...stroke}
      d="M6.5 7l.9 12.1a1.5 1.5 0 0 0 1.5 1.4h6.2a1.5 1.5 0 0 0 1.5-1.4L17.5 7"
    />,
    <path key="c" {...stroke} d="M10 11v6M14 11v6" />,
  ],
});

export const DownloadIcon = /* @__PURE__ */ createIcon({
  displayName: 'DownloadIcon',
  path: [
    <path key="a" {...stroke} d="M12 3.5v11M7.5 10l4.5 4.5 4.5-4.5" />,
    <path key="b" {...stroke} d="M4.5 16.5v2a2 2 0 0 0 2 2h11a2 2 0 0 0 2-2v-2" />,
  ],
});

export const UploadIcon = /* @__PURE__ */ createIcon({
  displayName: 'UploadIcon',
  path: [
    <path key="a" {...stroke} d="M12 15V4M7.5 8.5 12 4l4.5 4.5" />,
    <path key="b" {...stroke} d="M4.5 16.5v2a2 2 0 0 0 2 2h11a2 2 0 0 0 2-2v-2" />,
  ],
});

export const ClockIcon = /* @__PURE__ */ createIcon({
  displayName: 'ClockIcon',
  path: [
    <circle key="a" {...stroke} cx="12" cy="12" r="8.5" />,
    <path key="b" {...stroke} d="M12 7.5V12l3 2" />,
  ],
});

export const HourglassIcon = /* @__PURE__ */ createIcon({
  displayName: 'HourglassIcon',
  path: [
    <path key="a" {...stroke} d="M6.5 3.5h11M6.5 20.5h11" />,
    <path
      key="b"
      {...stroke}
      d="M7.5 3.5c0 4 4.5 5.5 4.5 8.5s-4.5 4.5-4.5 8.5M16.5 3.5c0 4-4.5 5.5-4.5 8.5s4.5 4.5 4.5 8.5"
    />,
  ],
});

export const PinIcon = /* @__PURE__ */ createIcon({
  displayName: 'PinIcon',
  path: [
    <path key="a" {...stroke} d="M12 21s-6.5-5.6-6.5-11a6.5 6.5 0 0 1 13 0c0 5.4-6.5 11-6.5 11Z" />,
    <circle key="b" {...stroke} cx="12" cy="10" r="2.3" />,
  ],
});

export const PhoneIcon = /* @__PURE__ */ createIcon({
  displayName: 'PhoneIcon',
  path: (
    <path
      {...stroke}
      d="M5 4h3.2l1.6 4-2 1.3a10.5 10.5 0 0 0 4.9 4.9l1.3-2 4 1.6V17a2 2 0 0 1-2 2A14 14 0 0 1 3 6a2 2 0 0 1 2-2Z"
    />
  ),
});

export const LockIcon = /* @__PURE__ */ createIcon({
  displayName: 'LockIcon',
  path: [
    <rect key="a" {...stroke} x="5" y="10.5" width="14" height="10" rx="2" />,
    <path key="b" {...stroke} d="M8 10.5V8a4 4 0 0 1 8 0v2.5" />,
  ],
});

export const ReceiptIcon = /* @__PURE__ */ createIcon({
  displayName: 'ReceiptIcon',
  path: [
    <path key="a" {...stroke} d="M6 3.5h12v17l-2-1.3-2 1.3-2-1.3-2 1.3-2-1.3-2 1.3Z" />,
    <path key="b" {...stroke} d="M9 8h6M9 11.5h6M9 15h3.5" />,
  ],
});

export const InfoIcon = /* @__PURE__ */ createIcon({
  displayName: 'InfoIcon',
  path: [
    <circle key="a" {...stroke} cx="12" cy="12" r="8.5" />,
    <path key="b" {...stroke} d="M12 11v5.5M12 7.8h.01" />,
  ],
});

export const CrossIcon = /* @__PURE__ */ createIcon({
  displayName: 'CrossIcon',
  path: <path {...stroke} d="M6.5 6.5l11 11M17.5 6.5l-11 11" />,
});

/** A closed day: a circle with a bar, like a "no entry" sign. */
export const ClosedIcon = /* @__PURE__ */ createIcon({
  displayName: 'ClosedIcon',
  path: [
    <circle key="a" {...stroke} cx="12" cy="12" r="8.5" />,
    <path key="b" {...stroke} d="M7.5 12h9" />,
  ],
});

/** A full day: a plate with a filled well. */
export const FullPlateIcon = /* @__PURE__ */ createIcon({
  displayName: 'FullPlateIcon',
  path: [
    <circle key="a" {...stroke} cx="12" cy="12" r="9" />,
    <circle key="b" cx="12" cy="12" r="5.5" fill="currentColor" />,
  ],
});

export const LeafIcon = /* @__PURE__ */ createIcon({
  displayName: 'LeafIcon',
  path: [
    <path key="a" {...stroke} d="M5 19C5 10.5 10 5.5 19.5 5c0 9-5 14-14.5 14Z" />,
    <path key="b" {...stroke} d="M5 19l8.5-8.5" />,
  ],
});

export const SproutIcon = /* @__PURE__ */ createIcon({
  displayName: 'SproutIcon',
  path: [
    <path key="a" {...stroke} d="M12 21v-9" />,
    <path key="b" {...stroke} d="M12 12c0-4-2.8-6.2-7-6.2 0 4 2.8 6.2 7 6.2Z" />,
    <path key="c" {...stroke} d="M12 10c0-3.6 2.5-5.7 6.5-5.7 0 3.6-2.5 5.7-6.5 5.7Z" />,
  ],
});

/** A cocktail glass: alcohol. */
export const GlassIcon = /* @__PURE__ */ createIcon({
  displayName: 'GlassIcon',
  path: [
    <path key="a" {...stroke} d="M4.5 4.5h15L12 12.5Z" />,
    <path key="b" {...stroke} d="M12 12.5v7.5M8.5 20h7" />,
  ],
});

/** A jelly in its mould: gelatin. */
export const JellyIcon = /* @__PURE__ */ createIcon({
  displayName: 'JellyIcon',
  path: [
    <path key="a" {...stroke} d="M4.5 19.5h15" />,
    <path key="b" {...stroke} d="M6.5 19.5 8 10h8l1.5 9.5" />,
    <path key="c" {...stroke} d="M8 10c0-2.4 1.8-4.5 4-4.5s4 2.1 4 4.5M10 13.5v3M14 13.5v3" />,
  ],
});

export const CardIcon = /* @__PURE__ */ createIcon({
  displayName: 'CardIcon',
  path: [
    <rect key="a" {...stroke} x="3" y="5.5" width="18" height="13" rx="2" />,
    <path key="b" {...stroke} d="M3 9.5h18M7 15h3" />,
  ],
});

export const FileIcon = /* @__PURE__ */ createIcon({
  displayName: 'FileIcon',
  path: [
    <path key="a" {...stroke} d="M6.5 3.5h7l4 4v13h-11Z" />,
    <path key="b" {...stroke} d="M13.5 3.5v4h4" />,
  ],
});
