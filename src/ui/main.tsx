import { render } from 'preact';
import { App } from './app/index.tsx';
import { AppVersion } from './components/app-version/index.tsx';
import { UpdateBanner } from './components/update-banner/index.tsx';
import { registerServiceWorker } from './sw-bridge.ts';
import './app/style.css';

render(
  <>
    <UpdateBanner />
    <AppVersion />
    <App />
  </>,
  document.getElementById('app')!,
);
registerServiceWorker();
