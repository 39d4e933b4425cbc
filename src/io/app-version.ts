/** The app's name and version as written into backup files (kept equal to package.json's by a test). */
export const APP_NAME = 'Trialbook';
export const APP_VERSION = '0.1.0';
