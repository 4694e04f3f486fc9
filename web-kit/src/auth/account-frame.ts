import type { ComponentType, ReactNode } from 'react';

/** What a flow hands the app's card for each of its states. */
export interface AccountCardProps {
  title: string;
  intro: ReactNode;
  /** Under the card's content; `undefined` where a state has none. */
  footer: ReactNode;
  children: ReactNode;
}

/**
 * What an app puts around the signed-out account flows (Forgot your password?, Choose a new
 * password): its card, its document title, its links. web-kit knows no router, so the app passes
 * its own link component; it must hand extra props on to its `<a>` (buttons render it `asChild`).
 */
export interface AccountFrameProps {
  Card: ComponentType<AccountCardProps>;
  /** Sets the document title from the page's name (the app adds its own suffix). */
  PageTitle: ComponentType<{ children: string }>;
  /** A link inside the app, e.g. react-router's `Link`. */
  Link: ComponentType<{ to: string; children: ReactNode }>;
  /** The "Sign in" link of the card's footer, in the app's own text-link style. */
  signInLink: ReactNode;
}
