import { render } from 'preact';
import { App } from './app/index.tsx';
import './app/style.css';

render(<App />, document.getElementById('app')!);
