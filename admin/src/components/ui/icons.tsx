import { createIcon } from '@chakra-ui/react';
import { iconStroke as stroke } from '@nappe/web-kit';

// Line icons of our own, drawn on a 24-unit grid with a 1.75 stroke.

export const SpoonIcon = /* @__PURE__ */ createIcon({
  displayName: 'SpoonIcon',
  path: [
    <ellipse key="a" {...stroke} cx="9" cy="8.5" rx="5" ry="6" transform="rotate(-35 9 8.5)" />,
    <path key="b" {...stroke} d="M12.5 13l7.5 8" />,
    <path
      key="c"
      fill="currentColor"
      d="M5.4 6.2c1.6-2.3 4.6-2.8 6.4-1.2-.4 1.3-1.2 1.9-1.6 1.1-.7 1.7-1.6 1.6-1.8.6-.9 1.5-1.9 1-1.9-.1-.5.6-1.2.4-1.1-.4Z"
    />,
  ],
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

export const MenuIcon = /* @__PURE__ */ createIcon({
  displayName: 'MenuIcon',
  path: <path {...stroke} d="M4 7h16M4 12h16M4 17h16" />,
});

export const ChevronLeftIcon = /* @__PURE__ */ createIcon({
  displayName: 'ChevronLeftIcon',
  path: <path {...stroke} d="M14.5 6l-6 6 6 6" />,
});

export const ChevronRightIcon = /* @__PURE__ */ createIcon({
  displayName: 'ChevronRightIcon',
  path: <path {...stroke} d="M9.5 6l6 6-6 6" />,
});

export const AllergyIcon = /* @__PURE__ */ createIcon({
  displayName: 'AllergyIcon',
  path: [
    <path key="a" {...stroke} d="M12 3.5l8.5 15h-17z" />,
    <path key="b" {...stroke} d="M12 10v4M12 16.5v.5" />,
  ],
});

export const WhiskIcon = /* @__PURE__ */ createIcon({
  displayName: 'WhiskIcon',
  path: [
    <path key="a" {...stroke} d="M12 13.5V21" />,
    <path
      key="b"
      {...stroke}
      d="M12 13.5c-4 0-5.5-4-5.5-6.5S9 2.5 12 2.5s5.5 2 5.5 4.5-1.5 6.5-5.5 6.5Z"
    />,
    <path
      key="c"
      {...stroke}
      d="M12 13.5c-1.6 0-2.5-4-2.5-6.5s1-4.5 2.5-4.5 2.5 2 2.5 4.5-.9 6.5-2.5 6.5Z"
    />,
  ],
});

export const InboxIcon = /* @__PURE__ */ createIcon({
  displayName: 'InboxIcon',
  path: [
    <path key="a" {...stroke} d="M3.5 13.5l2.5-8h12l2.5 8v5h-17z" />,
    <path key="b" {...stroke} d="M3.5 13.5h5l1 2h5l1-2h5" />,
  ],
});

export const PlusIcon = /* @__PURE__ */ createIcon({
  displayName: 'PlusIcon',
  path: <path {...stroke} d="M12 5v14M5 12h14" />,
});

export const TrashIcon = /* @__PURE__ */ createIcon({
  displayName: 'TrashIcon',
  path: [
    <path key="a" {...stroke} d="M4.5 7h15M9.5 7V4.5h5V7" />,
    <path key="b" {...stroke} d="M6.5 7l1 13h9l1-13M10 11v5.5M14 11v5.5" />,
  ],
});

export const ArrowUpIcon = /* @__PURE__ */ createIcon({
  displayName: 'ArrowUpIcon',
  path: <path {...stroke} d="M12 19V5M6.5 10.5 12 5l5.5 5.5" />,
});

export const ArrowDownIcon = /* @__PURE__ */ createIcon({
  displayName: 'ArrowDownIcon',
  path: <path {...stroke} d="M12 5v14M6.5 13.5 12 19l5.5-5.5" />,
});

export const SearchIcon = /* @__PURE__ */ createIcon({
  displayName: 'SearchIcon',
  path: [
    <circle key="a" {...stroke} cx="10.5" cy="10.5" r="6" />,
    <path key="b" {...stroke} d="M15 15l5 5" />,
  ],
});

/** Two stacked chevrons: a column that can be sorted either way. */
export const SortIcon = /* @__PURE__ */ createIcon({
  displayName: 'SortIcon',
  path: <path {...stroke} d="M8 10l4-4 4 4M8 14l4 4 4-4" />,
});

/** A hand scale: the Scale view of a recipe. */
export const ScaleIcon = /* @__PURE__ */ createIcon({
  displayName: 'ScaleIcon',
  path: [
    <path key="a" {...stroke} d="M12 4v16M7 20h10M5 7h14" />,
    <path key="b" {...stroke} d="M5 7l-2.5 6a2.5 2.5 0 0 0 5 0zM19 7l-2.5 6a2.5 2.5 0 0 0 5 0z" />,
  ],
});

export const UploadIcon = /* @__PURE__ */ createIcon({
  displayName: 'UploadIcon',
  path: [
    <path key="a" {...stroke} d="M12 15.5V4M7 8.5 12 4l5 4.5" />,
    <path key="b" {...stroke} d="M4.5 14.5v5h15v-5" />,
  ],
});

/** A dotted ring: "may contain" (a trace), beside the triangle used for "contains". */
export const TraceIcon = /* @__PURE__ */ createIcon({
  displayName: 'TraceIcon',
  path: [
    <circle key="a" {...stroke} cx="12" cy="12" r="7.5" strokeDasharray="2 3" />,
    <circle key="b" fill="currentColor" cx="12" cy="12" r="1.75" />,
  ],
});

/** A flame over a line: a step that can hurt (hot sugar, custard, cooling, freezing). */
export const CautionIcon = /* @__PURE__ */ createIcon({
  displayName: 'CautionIcon',
  path: [
    <path
      key="a"
      {...stroke}
      d="M12 3.5c.5 3-3.5 5-3.5 9a3.5 3.5 0 0 0 7 0c0-1.6-.7-2.7-1.5-3.6-.2 1.4-.9 2.1-1.6 2.1.6-2.7-.1-5.4-.4-7.5Z"
    />,
    <path key="b" {...stroke} d="M6 20.5h12" />,
  ],
});

export const ChevronDownIcon = /* @__PURE__ */ createIcon({
  displayName: 'ChevronDownIcon',
  path: <path {...stroke} d="M6 9.5l6 6 6-6" />,
});

/** A tray with an arrow dropping into it. */
export const DownloadIcon = /* @__PURE__ */ createIcon({
  displayName: 'DownloadIcon',
  path: [
    <path key="a" {...stroke} d="M12 3.5v11M7.5 10l4.5 4.5 4.5-4.5" />,
    <path key="b" {...stroke} d="M4 15.5v3a2 2 0 0 0 2 2h12a2 2 0 0 0 2-2v-3" />,
  ],
});
