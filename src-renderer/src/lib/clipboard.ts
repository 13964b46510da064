import type { Chart } from 'chart.js';

/**
 * Copying to the system clipboard through the web Clipboard API. It works in the browser shell
 * (127.0.0.1 is a secure context) and in Electron, whose main process grants the renderer
 * 'clipboard-sanitized-write' only. Failures come back as sentences a person can act on.
 */

/** Pixel ratio of copied chart images: sharp when pasted into a report and scaled down. */
export const COPY_PIXEL_RATIO = 3;

function clipboardOrThrow(): Clipboard {
  if (!window.isSecureContext || !navigator.clipboard) throw new Error('This window has no access to the clipboard.');
  return navigator.clipboard;
}

/** The reason a copy failed, in words. */
export function copyFailure(e: unknown): string {
  const name = e instanceof DOMException ? e.name : '';
  if (name === 'NotAllowedError') return 'The clipboard refused the copy. Click in the window and try again.';
  if (name === 'NotSupportedError' || name === 'DataError')
    return 'The clipboard does not take this kind of content here.';
  return e instanceof Error ? e.message : String(e);
}

export async function copyText(text: string): Promise<void> {
  await clipboardOrThrow().writeText(text);
}

/** Copies a PNG; the blob may still be rendering (a promise keeps the click's permission to copy). */
export async function copyPng(png: Promise<Blob>): Promise<void> {
  const clipboard = clipboardOrThrow();
  if (typeof ClipboardItem === 'undefined') throw new Error('This window cannot put images on the clipboard.');
  await clipboard.write([new ClipboardItem({ 'image/png': png })]);
}

/**
 * The chart redrawn at `ratio` device pixels per CSS pixel, on white (a bare canvas is transparent and
 * would paste as dark-on-dark in some programs). The chart is drawn at the high ratio, copied and put
 * back in the same task, so the screen never shows the change.
 */
export function chartPng(
  chart: Chart,
  ratio = Math.max(COPY_PIXEL_RATIO, window.devicePixelRatio || 1),
): Promise<Blob> {
  const shown = chart.options.devicePixelRatio;
  const copy = document.createElement('canvas');
  try {
    chart.options.devicePixelRatio = ratio;
    chart.resize();
    copy.width = chart.canvas.width;
    copy.height = chart.canvas.height;
    const ctx = copy.getContext('2d');
    if (!ctx) throw new Error('The chart could not be drawn for copying.');
    ctx.fillStyle = '#ffffff';
    ctx.fillRect(0, 0, copy.width, copy.height);
    ctx.drawImage(chart.canvas, 0, 0);
  } finally {
    chart.options.devicePixelRatio = shown;
    chart.resize();
  }
  return new Promise((done, fail) =>
    copy.toBlob((b) => (b ? done(b) : fail(new Error('The chart could not be turned into an image.'))), 'image/png'),
  );
}
