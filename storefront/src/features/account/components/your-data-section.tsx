import { Alert, Button, Heading, HStack, Stack, Text } from '@chakra-ui/react';
import { useState } from 'react';
import { DownloadIcon } from '../../../components/ui/booking-icons';
import { ApiError } from '../../../lib/api-client';
import type { AccountDeletion } from '../api/delete-account';
import { useDownloadMyData } from '../api/download-my-data';
import { DeleteAccountDialog } from './delete-account-dialog';

/**
 * A client's data in My events: a copy of everything held about them (GDPR Art. 15/20) and the
 * deletion of their account (Art. 17). `onDeleted` signs the person out and leaves the page.
 */
export function YourDataSection({ onDeleted }: { onDeleted: (result: AccountDeletion) => void }) {
  const download = useDownloadMyData();
  const [deleting, setDeleting] = useState(false);

  return (
    <Stack
      as="section"
      aria-labelledby="your-data-heading"
      gap="4"
      mt="16"
      pt="8"
      borderTopWidth="1px"
      borderColor="border"
    >
      <Heading id="your-data-heading" as="h2" fontSize="2xl" fontWeight="normal">
        Your data
      </Heading>
      <Text color="fg.muted" maxW="2xl">
        Download everything Nappe holds about you — your account, your bookings, your guests’
        details while they are kept, your payments and refunds, and who in the studio opened your
        guests’ details — as a file you can keep or take elsewhere. Guests’ allergies and diets are
        erased a few weeks after each event.
      </Text>
      {download.error && (
        <Alert.Root status="error" role="alert" borderRadius="l2">
          <Alert.Indicator />
          <Alert.Content>
            <Alert.Title>Your data could not be downloaded</Alert.Title>
            <Alert.Description>
              {download.error instanceof ApiError
                ? download.error.messages.join(' ')
                : 'Please try again.'}
            </Alert.Description>
          </Alert.Content>
        </Alert.Root>
      )}
      <HStack gap="3" wrap="wrap">
        <Button
          variant="outline"
          loading={download.isPending}
          loadingText="Preparing your file…"
          onClick={() => download.mutate()}
        >
          <DownloadIcon /> Download my data
        </Button>
        <Button variant="outline" colorPalette="danger" onClick={() => setDeleting(true)}>
          Delete my account
        </Button>
      </HStack>
      <DeleteAccountDialog open={deleting} onOpenChange={setDeleting} onDeleted={onDeleted} />
    </Stack>
  );
}
