import { createIcon } from '@chakra-ui/react';
import { iconStroke as stroke } from '@nappe/web-kit';

// Line icons of our own for the allergy notes, on the same 24-unit grid and 1.75 stroke as
// components/ui/icons.tsx.

/** A tick in a circle: the plate the guest gets has nothing that conflicts. */
export const ClearIcon = /* @__PURE__ */ createIcon({
  displayName: 'ClearIcon',
  path: [
    <circle key="a" {...stroke} cx="12" cy="12" r="8.5" />,
    <path key="b" {...stroke} d="M8 12.3l2.7 2.7L16 9.5" />,
  ],
});

/** Two arrows swapping places: a component left out or replaced on one guest's plate. */
export const SwapIcon = /* @__PURE__ */ createIcon({
  displayName: 'SwapIcon',
  path: [
    <path key="a" {...stroke} d="M4 8.5h13.5M14 5l3.5 3.5L14 12" />,
    <path key="b" {...stroke} d="M20 15.5H6.5M10 12l-3.5 3.5L10 19" />,
  ],
});

/** A sheet with a fold and a downward arrow: download the printable briefing. */
export const DocumentIcon = /* @__PURE__ */ createIcon({
  displayName: 'DocumentIcon',
  path: [
    <path key="a" {...stroke} d="M6.5 3.5h7l4 4v13h-11z" />,
    <path key="b" {...stroke} d="M13.5 3.5v4h4M12 10.5v6M9.5 14l2.5 2.5 2.5-2.5" />,
  ],
});

/** A printer: print this page. */
export const PrintIcon = /* @__PURE__ */ createIcon({
  displayName: 'PrintIcon',
  path: [
    <path key="a" {...stroke} d="M7 9V3.5h10V9" />,
    <rect key="b" {...stroke} x="3.5" y="9" width="17" height="7.5" rx="1.5" />,
    <path key="c" {...stroke} d="M7 14h10v6.5H7z" />,
  ],
});
