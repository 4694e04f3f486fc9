import { Box, chakra, type BoxProps } from '@chakra-ui/react';
import { GRID_PHOTO_SIZES, photoSrcSet, type PhotoSource } from './photo-source';
import { PlateIllustration } from './plate-illustration';

export type { PhotoSource } from './photo-source';

const Img = chakra('img');

/**
 * A dish photo in a frame of fixed proportions, so nothing moves when it arrives (width and
 * height are set from the API's figures). The first photo of a page loads at once, the rest
 * when they come near the screen. Without a photo, our drawing of a plate stands in.
 */
export function Photo({
  photo,
  alt,
  priority = false,
  sizes = GRID_PHOTO_SIZES,
  aspectRatio = 4 / 3,
  ...frame
}: {
  photo: PhotoSource | undefined;
  alt: string;
  /** The page's first, largest image: load it eagerly and early. */
  priority?: boolean;
  sizes?: string;
  aspectRatio?: number;
} & BoxProps) {
  return (
    <Box
      position="relative"
      overflow="hidden"
      bg="bg.muted"
      style={{ aspectRatio: String(aspectRatio) }}
      {...frame}
    >
      {photo ? (
        <Img
          src={photo.url}
          srcSet={photoSrcSet(photo)}
          sizes={sizes}
          htmlWidth={photo.width}
          htmlHeight={photo.height}
          alt={alt}
          loading={priority ? 'eager' : 'lazy'}
          decoding="async"
          {...(priority ? { fetchPriority: 'high' as const } : {})}
          position="absolute"
          inset="0"
          w="full"
          h="full"
          objectFit="cover"
        />
      ) : (
        <PlateIllustration position="absolute" inset="0" m="auto" w="70%" h="auto" top="15%" />
      )}
    </Box>
  );
}
