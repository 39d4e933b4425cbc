/**
 * The version string of this build: set by the build (vite.config.ts defines it from
 * TRIALBOOK_VERSION or package.json), shown at the foot of every screen so a person (and the
 * update test) can tell which version is running.
 */
import { APP_VERSION } from '../io/app-version.ts';

declare const __TRIALBOOK_VERSION__: string | undefined;

export const BUILD_VERSION: string = typeof __TRIALBOOK_VERSION__ === 'string' ? __TRIALBOOK_VERSION__ : APP_VERSION;
