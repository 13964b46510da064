/**
 * Packaging (electron-builder) and window settings for the desktop app.
 * Packaging downloads the Electron runtime, so it is not run in CI (see README "Desktop app").
 */
export const windowSettings = {
  width: 1440,
  height: 900,
  minWidth: 960,
  minHeight: 600,
  title: 'gprime',
  backgroundColor: '#f6f5f1',
} as const;

/** Site files use our own extension. */
export const SITE_FILE_EXTENSION = 'gpsite';

const config = {
  appId: 'org.gprime.desktop',
  productName: 'gprime',
  directories: { output: 'dist/packages', buildResources: 'build-resources' },
  files: ['dist/electron/**', 'dist/renderer/**', 'package.json'],
  extraResources: [
    { from: 'examples', to: 'examples' },
    { from: 'shared-core/site/site.schema.json', to: 'site.schema.json' },
  ],
  fileAssociations: [
    { ext: SITE_FILE_EXTENSION, name: 'gprime site', description: 'gprime site file', role: 'Editor' },
  ],
  linux: { target: ['AppImage', 'deb'], category: 'Science' },
  win: { target: ['nsis'] },
  mac: { target: ['dmg'], category: 'public.app-category.education' },
  nsis: { oneClick: false, allowToChangeInstallationDirectory: true },
} as const;

export default config;
