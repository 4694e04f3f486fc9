import { Button, Stack, Text, type ButtonProps } from '@chakra-ui/react';
import { useState, type ReactNode } from 'react';
import { downloadFile } from '../../lib/download';
import { errorMessage } from '../../lib/error-message';
import { DownloadIcon } from './icons';

/**
 * Downloads one of the API's documents with the signed-in person's token: busy while it comes,
 * and a message beside the button if it does not.
 */
export function DownloadButton({
  path,
  fallbackName,
  children,
  ...props
}: {
  path: string;
  fallbackName: string;
  children: ReactNode;
} & Omit<ButtonProps, 'onClick' | 'children'>) {
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const download = async () => {
    setBusy(true);
    setProblem(null);
    try {
      await downloadFile(path, fallbackName);
    } catch (error) {
      setProblem(`The download failed: ${errorMessage(error)}`);
    } finally {
      setBusy(false);
    }
  };
  return (
    <Stack gap="1" align={{ base: 'stretch', sm: 'start' }}>
      <Button
        variant="outline"
        loading={busy}
        loadingText="Preparing…"
        onClick={() => void download()}
        {...props}
      >
        <DownloadIcon /> {children}
      </Button>
      {problem && (
        <Text role="alert" color="fg.error" textStyle="sm" maxW="xs">
          {problem}
        </Text>
      )}
    </Stack>
  );
}
