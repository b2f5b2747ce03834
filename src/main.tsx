// Latin faces only, the five weights the interface uses: one @font-face each, no unicode-range
// (a letter outside Latin falls back to the system font, letter by letter)
import '@fontsource/nunito/latin-400.css';
import '@fontsource/nunito/latin-600.css';
import '@fontsource/nunito/latin-700.css';
import '@fontsource/nunito/latin-800.css';
import '@fontsource/nunito/latin-900.css';
import './styles/index.css';

import { readPageState } from './app/page-state';
import { startApp } from './app/start-app';

const container = document.getElementById('root');
if (!container) throw new Error('index.html has no #root element');

/** After the browser has painted what it has (a frame, then a task), or at once in a hidden tab. */
function afterNextPaint(): Promise<void> {
  if (document.visibilityState === 'hidden') return Promise.resolve();
  return new Promise((resolve) => {
    requestAnimationFrame(() => setTimeout(resolve, 0));
    setTimeout(resolve, 100); // a browser that holds frames back still starts the app
  });
}

// The state the server sent with its HTML; `npm run dev` serves the bare index.html.
const state = readPageState(document);
// The server's HTML goes on screen before the app renders: the browser would otherwise run the
// (already fetched) code on and paint only after hydrating.
// No top-level await here: it would make the bundler split every module the pages share out of the entry.
void (state?.rendered ? afterNextPaint() : Promise.resolve()).then(() => startApp(container, state));
