import { Box } from '@chakra-ui/react';
import { useNavigation } from 'react-router';

/** A thin bar along the top of the page while the next screen's code or data loads. */
export function NavigationProgress() {
  const navigation = useNavigation();
  if (navigation.state === 'idle') return null;
  return (
    <Box
      role="progressbar"
      aria-label="Loading the next page"
      position="fixed"
      top="0"
      insetX="0"
      h="3px"
      zIndex="overlay"
      bg="accent.solid"
      transformOrigin="left"
      animation="nappe-progress 1.2s ease-in-out infinite"
      css={{
        '@keyframes nappe-progress': {
          '0%': { transform: 'scaleX(0.05)' },
          '50%': { transform: 'scaleX(0.7)' },
          '100%': { transform: 'scaleX(0.95)' },
        },
        '@media (prefers-reduced-motion: reduce)': { animation: 'none' },
      }}
    />
  );
}
