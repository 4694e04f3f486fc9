// First: starts loading this address's screen while the rest of the entry is being set up.
import './app/first-screen';
import { startApp } from './app/start-app';

const root = document.getElementById('root');
if (!root) throw new Error('The page has no #root element.');

// Not a top-level await: the screens' chunks import this one, which must finish evaluating first.
void startApp(root);
