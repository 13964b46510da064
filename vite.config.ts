import { defineConfig } from 'vite';
import { svelte } from '@sveltejs/vite-plugin-svelte';

// The renderer: built to dist/renderer, loaded by Electron from file:// (hence base './') and by the browser shell.
export default defineConfig({
  root: 'src-renderer',
  base: './',
  plugins: [svelte()],
  build: { outDir: '../dist/renderer', emptyOutDir: true, chunkSizeWarningLimit: 2000 },
});
