import { createCanvas, GlobalFonts, SvgExportFlag, type Canvas, type SKRSContext2D } from '@napi-rs/canvas';
import {
  Chart,
  LinearScale,
  LineElement,
  PointElement,
  ScatterController,
  Title,
  type ChartConfiguration,
  type Plugin,
} from 'chart.js';
import { LINE_STYLES, type ChartSpec } from '../../shared-core/report/charts';
import { formatValue } from '../../shared-core/report/format';
import { fontPath, FONT_FAMILY } from './assets';

/**
 * Draws a report chart with chart.js on @napi-rs/canvas: PNG at a chosen dpi and SVG with text kept as
 * text. Below the plot sit a legend that shows each curve's dash pattern and marker (readable in
 * grayscale) and, optionally, the caption.
 */

Chart.register(ScatterController, LineElement, PointElement, LinearScale, Title);

let fontsReady = false;
function ensureFonts(): void {
  if (fontsReady) return;
  GlobalFonts.registerFromPath(fontPath('DejaVuSans.ttf'), FONT_FAMILY);
  GlobalFonts.registerFromPath(fontPath('DejaVuSans-Bold.ttf'), FONT_FAMILY);
  Chart.defaults.font.family = FONT_FAMILY;
  Chart.defaults.color = '#222222';
  fontsReady = true;
}

export interface ChartSize {
  /** drawing width and height in inches */
  widthIn: number;
  heightIn: number;
  /** PNG resolution; SVG ignores it */
  dpi: number;
  /** draw the caption below the legend (standalone files); the PDF sets its caption as text instead */
  caption: boolean;
  /** a line under the caption naming the document and site file (standalone files) */
  stamp?: string;
}

export const DEFAULT_CHART_SIZE: ChartSize = { widthIn: 6.5, heightIn: 4.2, dpi: 300, caption: true };

/** CSS pixels per inch of the chart layout (font sizes are in these pixels). */
const PX_PER_IN = 100;
const LEGEND_FONT = 12;
const CAPTION_FONT = 12;
const SAMPLE = 34;

interface LegendItem {
  label: string;
  style: number;
  width: number;
}
interface BottomLayout {
  items: LegendItem[][];
  caption: string[];
  stamp: string[];
  height: number;
}

const STAMP_FONT = 9;

function wrapText(ctx: SKRSContext2D, text: string, width: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter(Boolean)) {
    const next = line ? `${line} ${word}` : word;
    if (line && ctx.measureText(next).width > width) {
      lines.push(line);
      line = word;
    } else line = next;
  }
  if (line) lines.push(line);
  return lines;
}

/** Lays out legend rows and caption lines for the space under the plot. */
function bottomLayout(
  ctx: SKRSContext2D,
  spec: ChartSpec,
  width: number,
  caption: boolean,
  stamp: string | undefined,
): BottomLayout {
  ctx.font = `${LEGEND_FONT}px "${FONT_FAMILY}"`;
  const rows: LegendItem[][] = [[]];
  let used = 0;
  for (const d of spec.datasets) {
    const w = SAMPLE + 6 + ctx.measureText(d.label).width + 18;
    if (used + w > width && rows[rows.length - 1].length) {
      rows.push([]);
      used = 0;
    }
    rows[rows.length - 1].push({ label: d.label, style: d.style, width: w });
    used += w;
  }
  ctx.font = `${CAPTION_FONT}px "${FONT_FAMILY}"`;
  const lines = caption ? wrapText(ctx, spec.caption, width) : [];
  ctx.font = `${STAMP_FONT}px "${FONT_FAMILY}"`;
  const stampLines = stamp ? wrapText(ctx, stamp, width) : [];
  return {
    items: rows,
    caption: lines,
    stamp: stampLines,
    height:
      rows.length * 20 +
      (lines.length ? lines.length * 16 + 8 : 0) +
      (stampLines.length ? stampLines.length * 12 + 4 : 0) +
      6,
  };
}

function drawMarker(ctx: SKRSContext2D, marker: string, x: number, y: number, r: number): void {
  ctx.beginPath();
  switch (marker) {
    case 'rect':
      ctx.rect(x - r, y - r, 2 * r, 2 * r);
      break;
    case 'rectRot':
      ctx.moveTo(x, y - r * 1.3);
      ctx.lineTo(x + r * 1.3, y);
      ctx.lineTo(x, y + r * 1.3);
      ctx.lineTo(x - r * 1.3, y);
      ctx.closePath();
      break;
    case 'triangle':
      ctx.moveTo(x, y - r * 1.3);
      ctx.lineTo(x + r * 1.2, y + r);
      ctx.lineTo(x - r * 1.2, y + r);
      ctx.closePath();
      break;
    case 'crossRot':
    case 'star':
      ctx.moveTo(x - r, y - r);
      ctx.lineTo(x + r, y + r);
      ctx.moveTo(x + r, y - r);
      ctx.lineTo(x - r, y + r);
      if (marker === 'star') {
        ctx.moveTo(x, y - r * 1.3);
        ctx.lineTo(x, y + r * 1.3);
      }
      ctx.stroke();
      return;
    default:
      ctx.arc(x, y, r, 0, 2 * Math.PI);
  }
  ctx.fill();
  ctx.stroke();
}

function bottomPlugin(layout: BottomLayout, width: number, height: number): Plugin<'scatter'> {
  return {
    id: 'gprimeFrame',
    beforeDraw(chart) {
      const ctx = chart.ctx as unknown as SKRSContext2D;
      ctx.save();
      ctx.fillStyle = '#ffffff';
      ctx.fillRect(0, 0, width, height);
      ctx.restore();
    },
    afterDraw(chart) {
      const ctx = chart.ctx as unknown as SKRSContext2D;
      ctx.save();
      let y = height - layout.height + 12;
      ctx.font = `${LEGEND_FONT}px "${FONT_FAMILY}"`;
      ctx.textBaseline = 'middle';
      for (const row of layout.items) {
        let x = (width - row.reduce((s, i) => s + i.width, 0)) / 2;
        for (const item of row) {
          const st = LINE_STYLES[item.style % LINE_STYLES.length];
          ctx.strokeStyle = st.color;
          ctx.fillStyle = st.color;
          ctx.lineWidth = 2;
          ctx.setLineDash([...st.dash]);
          ctx.beginPath();
          ctx.moveTo(x, y);
          ctx.lineTo(x + SAMPLE, y);
          ctx.stroke();
          ctx.setLineDash([]);
          ctx.lineWidth = 1;
          drawMarker(ctx, st.marker, x + SAMPLE / 2, y, 3.5);
          ctx.fillStyle = '#222222';
          ctx.fillText(item.label, x + SAMPLE + 6, y);
          x += item.width;
        }
        y += 20;
      }
      ctx.font = `${CAPTION_FONT}px "${FONT_FAMILY}"`;
      ctx.fillStyle = '#333333';
      ctx.textBaseline = 'top';
      y += 2;
      for (const line of layout.caption) {
        ctx.fillText(line, (width - ctx.measureText(line).width) / 2, y);
        y += 16;
      }
      ctx.font = `${STAMP_FONT}px "${FONT_FAMILY}"`;
      ctx.fillStyle = '#555555';
      y += 4;
      for (const line of layout.stamp) {
        ctx.fillText(line, (width - ctx.measureText(line).width) / 2, y);
        y += 12;
      }
      ctx.restore();
    },
  };
}

function config(
  spec: ChartSpec,
  layout: BottomLayout,
  width: number,
  height: number,
  dpr: number,
): ChartConfiguration<'scatter'> {
  const axis = (a: ChartSpec['x']) => ({
    type: 'linear' as const,
    reverse: a.reverse,
    title: { display: true, text: a.title, font: { size: 13 } },
    // ticks in the report's number style (4.365×10⁻⁵, never 1.000000E-5)
    ticks: { font: { size: 11 }, maxTicksLimit: 8, callback: (v: number | string) => formatValue(Number(v), 4) },
    grid: { color: '#dddddd' },
    border: { color: '#555555' },
  });
  return {
    type: 'scatter',
    data: {
      datasets: spec.datasets.map((d) => {
        const st = LINE_STYLES[d.style % LINE_STYLES.length];
        const step = Math.max(1, Math.ceil(d.points.length / 25));
        return {
          label: d.label,
          data: d.points.map((p) => ({ x: p.x as number, y: p.y as number })),
          showLine: true,
          spanGaps: false,
          borderColor: st.color,
          backgroundColor: st.color,
          borderWidth: 2,
          borderDash: [...st.dash],
          pointStyle: st.marker,
          // a dataset of one point marks an event: drawn larger than the markers along a curve
          pointRadius: (c: { dataIndex: number }) => (d.points.length === 1 ? 7 : c.dataIndex % step === 0 ? 3.5 : 0),
          pointBorderWidth: 1,
        };
      }),
    },
    options: {
      animation: false,
      responsive: false,
      locale: 'en-US', // tick labels the same on every machine
      devicePixelRatio: dpr,
      layout: { padding: { top: 4, left: 8, right: 16, bottom: layout.height } },
      plugins: {
        title: { display: true, text: spec.title, font: { size: 15, weight: 'bold' }, padding: { top: 6, bottom: 10 } },
        legend: { display: false },
        tooltip: { enabled: false },
      },
      scales: { x: axis(spec.x), y: axis(spec.y) },
    },
    plugins: [bottomPlugin(layout, width, height)],
  };
}

function draw(spec: ChartSpec, size: ChartSize, kind: 'png' | 'svg') {
  ensureFonts();
  const width = Math.round(size.widthIn * PX_PER_IN);
  const height = Math.round(size.heightIn * PX_PER_IN);
  const canvas = kind === 'svg' ? createCanvas(width, height, SvgExportFlag.NoPrettyXML) : createCanvas(width, height);
  const layout = bottomLayout(canvas.getContext('2d'), spec, width - 40, size.caption, size.stamp);
  const dpr = kind === 'svg' ? 1 : size.dpi / PX_PER_IN;
  const chart = new Chart(
    canvas as unknown as ConstructorParameters<typeof Chart>[0],
    config(spec, layout, width, height, dpr),
  );
  return { canvas, chart };
}

/** PNG of the chart: widthIn·dpi × heightIn·dpi pixels, with the resolution recorded in the file. */
export function renderChartPng(spec: ChartSpec, size: ChartSize = DEFAULT_CHART_SIZE): Buffer {
  const { canvas, chart } = draw(spec, size, 'png');
  try {
    return withPhysicalSize((canvas as Canvas).toBuffer('image/png'), size.dpi);
  } finally {
    chart.destroy();
  }
}

/** Raw RGB pixels of the chart (white background, no alpha) for embedding in the PDF. */
export function renderChartRgb(
  spec: ChartSpec,
  size: ChartSize = DEFAULT_CHART_SIZE,
): { width: number; height: number; rgb: Buffer } {
  const { canvas, chart } = draw(spec, size, 'png');
  try {
    const c = canvas as Canvas;
    const rgba = c.getContext('2d').getImageData(0, 0, c.width, c.height).data;
    const rgb = Buffer.alloc(c.width * c.height * 3);
    for (let i = 0, j = 0; i < rgba.length; i += 4, j += 3) {
      rgb[j] = rgba[i];
      rgb[j + 1] = rgba[i + 1];
      rgb[j + 2] = rgba[i + 2];
    }
    return { width: c.width, height: c.height, rgb };
  } finally {
    chart.destroy();
  }
}

const xmlEscape = (s: string) =>
  s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

/** SVG of the chart (vector, text kept as text) with a <title> and <desc> naming the chart and its caption. */
export function renderChartSvg(spec: ChartSpec, size: ChartSize = DEFAULT_CHART_SIZE): string {
  const { canvas, chart } = draw(spec, size, 'svg');
  try {
    const svg = (canvas as unknown as { getContent(): Buffer }).getContent().toString('utf8');
    const meta = `<title>${xmlEscape(spec.title)}</title><desc>${xmlEscape(`${spec.caption}. Horizontal axis: ${spec.x.title}; vertical axis: ${spec.y.title}.${size.stamp ? ` ${size.stamp}.` : ''}`)}</desc>`;
    // the canvas numbers clip paths with a process-wide counter: renumber them so the same chart gives the same file
    const ids = new Map<string, string>();
    const stable = svg.replace(/\bcl_[0-9a-z]+\b/g, (id) => {
      if (!ids.has(id)) ids.set(id, `clip${ids.size + 1}`);
      return ids.get(id)!;
    });
    return stable.replace(/(<svg\b[^>]*>)/, `$1${meta}`);
  } finally {
    chart.destroy();
  }
}

const CRC_TABLE = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});

function crc32(bytes: Buffer): number {
  let c = 0xffffffff;
  for (const b of bytes) c = CRC_TABLE[(c ^ b) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

/** Inserts a pHYs chunk (pixels per metre) after IHDR so that word processors place the PNG at its size. */
function withPhysicalSize(png: Buffer, dpi: number): Buffer {
  const ppm = Math.round(dpi / 0.0254);
  const body = Buffer.alloc(13);
  body.write('pHYs', 0, 'latin1');
  body.writeUInt32BE(ppm, 4);
  body.writeUInt32BE(ppm, 8);
  body.writeUInt8(1, 12);
  const chunk = Buffer.alloc(21);
  chunk.writeUInt32BE(9, 0);
  body.copy(chunk, 4);
  chunk.writeUInt32BE(crc32(body), 17);
  const ihdrEnd = 8 + 8 + 13 + 4;
  return Buffer.concat([png.subarray(0, ihdrEnd), chunk, png.subarray(ihdrEnd)]);
}
