/**
 * Which version of Trialbook is running, in one small line above the title bar (drawn with the
 * first frame, so it never moves the content below it).
 */
import { BUILD_VERSION } from '../../build-version.ts';
import './style.css';

export type AppVersionProps = Record<string, never>;

export function AppVersion(_props: AppVersionProps) {
  return (
    <p class="app-version">
      version <span data-testid="app-version">{BUILD_VERSION}</span>
    </p>
  );
}
