import {
  Alert,
  Box,
  Button,
  CloseButton,
  Dialog,
  Image,
  Portal,
  Progress,
  SimpleGrid,
  Stack,
  Text,
} from '@chakra-ui/react';
import { useEffect, useId, useRef, useState } from 'react';
import { TrashIcon, UploadIcon } from '../../../components/ui/icons';
import { ApiError } from '../../../lib/api-client';
import { errorMessage } from '../../../lib/error-message';
import type { PhotoResponse } from '../api/types';

/** The API's limit (api/src/files/photo-upload.decorator.ts): 5 MB, JPEG, PNG or WebP. */
const MAX_BYTES = 5 * 1024 * 1024;
const ACCEPTED = ['image/jpeg', 'image/png', 'image/webp'];

function uploadFailure(error: unknown): string {
  if (!(error instanceof ApiError)) return 'The upload did not finish. Please try again.';
  if (error.status === 413) return `${error.messages.join(' ')} Photos up to 5 MB are accepted.`;
  if (error.status === 415) return `${error.messages.join(' ')} Use a JPEG, PNG or WebP photo.`;
  return errorMessage(error);
}

/**
 * Photos of a dessert or a menu: a preview of the chosen file while it uploads with its
 * progress, the server's words when it refuses (too large, not a photo), and removal after asking.
 */
export function PhotoManager({
  photos,
  subject,
  onUpload,
  onDelete,
}: {
  photos: PhotoResponse[];
  subject: string;
  onUpload: (file: File, onProgress: (share: number) => void) => Promise<unknown>;
  onDelete: (photoId: string) => Promise<unknown>;
}) {
  const inputId = useId();
  const input = useRef<HTMLInputElement>(null);
  const [preview, setPreview] = useState<string | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [removing, setRemoving] = useState<PhotoResponse | null>(null);
  const [removeError, setRemoveError] = useState<string | null>(null);
  const [removePending, setRemovePending] = useState(false);

  useEffect(() => () => (preview ? URL.revokeObjectURL(preview) : undefined), [preview]);

  const choose = async (file: File | undefined) => {
    if (!file) return;
    setError(null);
    if (!ACCEPTED.includes(file.type)) {
      setError('Use a JPEG, PNG or WebP photo.');
      return;
    }
    if (file.size > MAX_BYTES) {
      setError(
        `This photo is ${(file.size / 1024 / 1024).toFixed(1)} MB; photos up to 5 MB are accepted.`,
      );
      return;
    }
    setPreview(URL.createObjectURL(file));
    setProgress(0);
    try {
      await onUpload(file, setProgress);
    } catch (e) {
      setError(uploadFailure(e));
    } finally {
      setProgress(null);
      setPreview(null);
      if (input.current) input.current.value = '';
    }
  };

  const confirmRemove = async () => {
    if (!removing) return;
    setRemovePending(true);
    setRemoveError(null);
    try {
      await onDelete(removing.id);
      setRemoving(null);
    } catch (e) {
      setRemoveError(uploadFailure(e));
    } finally {
      setRemovePending(false);
    }
  };

  return (
    <Stack gap="4">
      {photos.length === 0 && progress === null && (
        <Text color="fg.muted">No photo yet. Clients see the first photo on the storefront.</Text>
      )}
      <SimpleGrid columns={{ base: 2, md: 3 }} gap="3">
        {photos.map((photo, i) => (
          <Box key={photo.id} position="relative" borderRadius="l2" overflow="hidden" bg="bg.muted">
            <Image
              src={photo.thumbnailUrl}
              alt={`${subject}, photo ${i + 1}`}
              width={photo.width}
              height={photo.height}
              w="full"
              h="auto"
              aspectRatio={`${photo.width} / ${photo.height}`}
              objectFit="cover"
              loading="lazy"
            />
            <Button
              position="absolute"
              top="2"
              right="2"
              size="xs"
              variant="solid"
              colorPalette="gray"
              aria-label={`Remove photo ${i + 1}`}
              onClick={() => setRemoving(photo)}
            >
              <TrashIcon />
            </Button>
          </Box>
        ))}
        {preview && (
          <Box borderRadius="l2" overflow="hidden" bg="bg.muted" opacity={0.7}>
            <Image
              src={preview}
              alt="The photo being uploaded"
              w="full"
              h="auto"
              objectFit="cover"
            />
          </Box>
        )}
      </SimpleGrid>
      {progress !== null && (
        <Progress.Root value={Math.round(progress * 100)} max={100} size="sm" maxW="sm">
          <Progress.Label>Uploading</Progress.Label>
          <Progress.Track>
            <Progress.Range />
          </Progress.Track>
          <Progress.ValueText>{Math.round(progress * 100)} %</Progress.ValueText>
        </Progress.Root>
      )}
      {error && (
        <Alert.Root status="error" role="alert" borderRadius="l2">
          <Alert.Indicator />
          <Alert.Content>
            <Alert.Title>The photo was not added</Alert.Title>
            <Alert.Description>{error}</Alert.Description>
          </Alert.Content>
        </Alert.Root>
      )}
      <Box>
        <input
          ref={input}
          id={inputId}
          type="file"
          accept={ACCEPTED.join(',')}
          style={{ position: 'absolute', width: 1, height: 1, opacity: 0, overflow: 'hidden' }}
          aria-label={`Add a photo of ${subject}`}
          disabled={progress !== null}
          onChange={(e) => void choose(e.target.files?.[0])}
        />
        <Button
          variant="outline"
          onClick={() => input.current?.click()}
          loading={progress !== null}
          loadingText="Uploading…"
        >
          <UploadIcon /> Add a photo
        </Button>
        <Text textStyle="xs" color="fg.muted" mt="1">
          JPEG, PNG or WebP, up to 5 MB. It is saved at once, apart from the form.
        </Text>
      </Box>

      <Dialog.Root
        role="alertdialog"
        open={removing !== null}
        onOpenChange={(e) => {
          if (!e.open) {
            setRemoving(null);
            setRemoveError(null);
          }
        }}
        placement="center"
      >
        <Portal>
          <Dialog.Backdrop />
          <Dialog.Positioner px="4">
            <Dialog.Content bg="bg.panel">
              <Dialog.Header>
                <Dialog.Title>Remove this photo?</Dialog.Title>
              </Dialog.Header>
              <Dialog.Body display="flex" flexDirection="column" gap="3">
                {removing && (
                  <Image
                    src={removing.thumbnailUrl}
                    alt=""
                    borderRadius="l2"
                    maxH="40"
                    objectFit="cover"
                  />
                )}
                <Text>It is removed from the storefront too.</Text>
                {removeError && (
                  <Text color="fg.error" role="alert">
                    {removeError}
                  </Text>
                )}
              </Dialog.Body>
              <Dialog.Footer>
                <Dialog.ActionTrigger asChild>
                  <Button variant="outline">Keep it</Button>
                </Dialog.ActionTrigger>
                <Button
                  colorPalette="danger"
                  loading={removePending}
                  onClick={() => void confirmRemove()}
                >
                  Remove photo
                </Button>
              </Dialog.Footer>
              <Dialog.CloseTrigger asChild>
                <CloseButton size="sm" aria-label="Close" />
              </Dialog.CloseTrigger>
            </Dialog.Content>
          </Dialog.Positioner>
        </Portal>
      </Dialog.Root>
    </Stack>
  );
}
