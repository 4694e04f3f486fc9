import type { AnchorHTMLAttributes } from 'react';
import type { AccountCardProps, AccountFrameProps } from './account-frame.js';

// A plain frame for the flows' tests, standing in for an app's card, title and router link.

function TestCard({ title, intro, footer, children }: AccountCardProps) {
  return (
    <main>
      <h1>{title}</h1>
      <p>{intro}</p>
      {children}
      {footer !== undefined && <footer>{footer}</footer>}
    </main>
  );
}

/** Hands on every prop, as react-router's Link does: buttons render it `asChild`. */
function TestLink({ to, ...props }: { to: string } & AnchorHTMLAttributes<HTMLAnchorElement>) {
  return <a href={to} {...props} />;
}

export const testFrame: AccountFrameProps = {
  Card: TestCard,
  PageTitle: ({ children }) => <title>{children}</title>,
  Link: TestLink,
  signInLink: <TestLink to="/sign-in">Sign in</TestLink>,
};
