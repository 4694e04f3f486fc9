import { Button, HStack, Text } from '@chakra-ui/react';
import { useEffect, useRef, useState } from 'react';
import { useLocation, useNavigate } from 'react-router';
import { paths } from '../../config/paths';
import { useLogout } from '@nappe/web-kit/auth';

/** The header's account controls for someone signed in: who they are, and a way out. */
export function SignedInActions({ name }: { name: string }) {
  const logout = useLogout();
  const { mutate: endSession } = logout;
  const navigate = useNavigate();
  const { pathname } = useLocation();
  const [leaving, setLeaving] = useState(false);
  const sessionToEnd = useRef(false);

  // Leave any private page first, so it is not asked to redirect to Sign in: the session ends
  // once the home page is on screen (a navigation's promise settles before React shows it).
  useEffect(() => {
    if (!sessionToEnd.current || pathname !== paths.home.path) return;
    sessionToEnd.current = false;
    // A booking in progress (with its guests' allergies) must not outlive the person in this
    // tab: it lives in sessionStorage only, so forget it with the session.
    try {
      window.sessionStorage.clear();
    } catch {
      // Storage switched off: there is nothing kept to forget.
    }
    endSession();
  }, [leaving, pathname, endSession]);

  return (
    <HStack gap="3">
      <Text
        textStyle="sm"
        color="fg.muted"
        display={{ base: 'none', sm: 'block' }}
        maxW="48"
        truncate
      >
        Signed in as{' '}
        <Text as="span" color="fg" fontWeight="medium">
          {name}
        </Text>
      </Text>
      <Button
        size="sm"
        variant="outline"
        loading={leaving || logout.isPending}
        loadingText="Signing out…"
        onClick={() => {
          sessionToEnd.current = true;
          setLeaving(true);
          void navigate(paths.home.getHref());
        }}
      >
        Sign out
      </Button>
    </HStack>
  );
}
