// The base stylesheet first, so the components' own rules follow it in the bundle.
import './app/style.css';
import { render } from 'preact';
import { App } from './app/index.tsx';
import { AppVersion } from './components/app-version/index.tsx';
import { UpdateBanner } from './components/update-banner/index.tsx';
import { registerServiceWorker } from './sw-bridge.ts';

render(
  <>
    <UpdateBanner />
    <AppVersion />
    <App />
  </>,
  document.getElementById('app')!,
);
registerServiceWorker();
