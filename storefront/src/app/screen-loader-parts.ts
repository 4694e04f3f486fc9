import type { ShouldRevalidateFunction } from 'react-router';
import { paths } from '../config/paths';
import type { NotFoundData } from './loaders';

/*
 * Loader pieces that only the screens' own chunks use (My events, an event, Dates): apart from
 * loaders.ts, which the entry carries for the first screens.
 */

export const EVENT_NOT_FOUND: NotFoundData = {
  title: 'We cannot find this event',
  message:
    'It is not among the events booked with this account. If you booked with another e-mail address, sign in with that one.',
  back: { href: paths.myEvents.getHref(), label: 'Back to My events' },
};

/**
 * For screens whose address changes within the page (a tab, a month): their data is already
 * in the cache and the screen asks for what it needs, so the loader need not run again.
 */
export const keepOnSearchChange: ShouldRevalidateFunction = ({
  currentUrl,
  nextUrl,
  defaultShouldRevalidate,
}) => (currentUrl.pathname === nextUrl.pathname ? false : defaultShouldRevalidate);
