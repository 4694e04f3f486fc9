import { createIcon } from '@chakra-ui/react';
import { iconStroke } from '../icon-stroke.js';

// The show/hide glyphs of the password field, drawn like the apps' other line icons.

export const EyeIcon = /* @__PURE__ */ createIcon({
  displayName: 'EyeIcon',
  path: [
    <path
      key="a"
      {...iconStroke}
      d="M2.5 12s3.5-6.5 9.5-6.5S21.5 12 21.5 12 18 18.5 12 18.5 2.5 12 2.5 12Z"
    />,
    <circle key="b" {...iconStroke} cx="12" cy="12" r="3" />,
  ],
});

export const EyeOffIcon = /* @__PURE__ */ createIcon({
  displayName: 'EyeOffIcon',
  path: [
    <path key="a" {...iconStroke} d="M4 4l16 16" />,
    <path
      key="b"
      {...iconStroke}
      d="M9.9 5.8A9.6 9.6 0 0 1 12 5.5c6 0 9.5 6.5 9.5 6.5a17 17 0 0 1-2.7 3.5"
    />,
    <path
      key="c"
      {...iconStroke}
      d="M6.6 7.7A16.6 16.6 0 0 0 2.5 12s3.5 6.5 9.5 6.5a9 9 0 0 0 4.2-1"
    />,
    <path key="d" {...iconStroke} d="M10 10a3 3 0 0 0 4 4.1" />,
  ],
});
