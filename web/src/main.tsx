import '@fontsource/source-sans-3/latin-400.css';
import '@fontsource/source-sans-3/latin-600.css';
import './app/global.css';

const root = document.getElementById('root');
if (!root) throw new Error('index.html must contain <div id="root">');

/**
 * index.html paints its own shell. The app's JavaScript (about 800 KB once unpacked) is compiled and evaluated in long
 * tasks that would hold that first frame back, even when listed as `modulepreload`; so it is fetched only after the
 * next frame (or after 100 ms, for a tab that is not painting).
 */
const afterNextFrame = new Promise<void>((resolve) => {
  requestAnimationFrame(() => setTimeout(resolve, 0));
  setTimeout(resolve, 100);
});

afterNextFrame
  .then(() => import('./app/start'))
  .then(({ startApp }) => startApp(root))
  .catch(() => {
    const status = root.querySelector('[role="status"] > span:last-child');
    if (status) status.textContent = 'Swapwright could not load. Check the connection, then reload the page.';
  });
