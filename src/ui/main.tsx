import { render } from 'preact';
import { App } from './app/index.tsx';
import { UpdateBanner } from './components/update-banner/index.tsx';
import { registerServiceWorker } from './sw-bridge.ts';
import './app/style.css';

render(
  <>
    <UpdateBanner />
    <App />
  </>,
  document.getElementById('app')!,
);
registerServiceWorker();
