import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { chartSpecs } from '../../shared-core/report';
import { renderChartPng, renderChartSvg } from '../../src-main/report/chart-render';
import { chartCsv } from '../../src-main/report/tables';

const [profile, twoCurves] = [
  chartSpecs(
    [
      {
        kind: 'profile-temperature',
        title: 'Temperature',
        x: { label: 'Depth', unit: 'm', values: [0.5, 5, 10, 20, 38] },
        y: [{ label: 'Temperature', unit: 'degC', values: [24.8, 24.1, 17.2, 10.5, 9.1] }],
        depthAxis: true,
        caption: 'Measured temperature against depth',
      },
    ],
    'si',
    'p',
  )[0],
  chartSpecs(
    [
      {
        kind: 'front-position',
        title: 'Front position',
        x: { label: 'Time', unit: 's', values: [0, 60, 120, 180] },
        y: [
          { label: 'Benjamin (1968)', unit: 'm', values: [0, 30, 58, 85] },
          { label: 'Shin et al. (2004)', unit: 'm', values: [0, 27, 52, 76] },
        ],
        caption: 'Front position after the release',
      },
    ],
    'si',
    'f',
  )[0],
];

/** Width, height and pHYs resolution read from the PNG chunks (PNG specification, ISO/IEC 15948:2004 §11.2.2, §11.3.5.3). */
function pngInfo(png: Buffer) {
  expect(png.subarray(1, 4).toString('latin1')).toBe('PNG');
  const info = { width: png.readUInt32BE(16), height: png.readUInt32BE(20), ppm: 0 };
  for (let at = 8; at < png.length;) {
    const len = png.readUInt32BE(at);
    if (png.toString('latin1', at + 4, at + 8) === 'pHYs') info.ppm = png.readUInt32BE(at + 8);
    at += 12 + len;
  }
  return info;
}

/**
 * Parses the SVG with Python's expat-based ElementTree (an independent XML parser) and returns its text
 * nodes joined by spaces (the canvas writes one <text> element per word).
 */
function svgText(svg: string): string {
  const py =
    "import sys,json,xml.etree.ElementTree as ET\nr=ET.fromstring(sys.stdin.buffer.read())\nprint(json.dumps([''.join(e.itertext()) for e in r.iter() if e.tag.split('}')[-1] in ('text','title','desc')]))";
  const r = spawnSync('/usr/bin/python3', ['-c', py], { input: svg, encoding: 'utf8' });
  expect(r.stderr).toBe('');
  return (JSON.parse(r.stdout) as string[]).join(' ').replace(/\s+/g, ' ');
}

describe('chart PNG', () => {
  it('has widthIn·dpi × heightIn·dpi pixels and records the resolution (300 dpi = 11811 px/m)', () => {
    const info = pngInfo(renderChartPng(profile));
    expect(info).toEqual({ width: 1950, height: 1260, ppm: Math.round(300 / 0.0254) });
    const small = pngInfo(renderChartPng(twoCurves, { widthIn: 4, heightIn: 3, dpi: 600, caption: true }));
    expect(small).toEqual({ width: 2400, height: 1800, ppm: Math.round(600 / 0.0254) });
  });
});

describe('chart SVG', () => {
  const svg = renderChartSvg(twoCurves);
  const text = svgText(svg);
  it('is well-formed XML with the title, axis titles with units, legend labels and caption as text', () => {
    for (const label of [
      'Front position',
      'Time (s)',
      'Benjamin (1968)',
      'Shin et al. (2004)',
      'Front position after the release',
    ]) {
      expect(text, label).toContain(label);
    }
    expect(text).toContain('Benjamin (1968), Shin et al. (2004) (m)');
  });
  it('is vector (no embedded bitmap) and the same chart gives the same file', () => {
    expect(svg).not.toMatch(/<image\b/);
    expect(renderChartSvg(twoCurves)).toBe(svg);
  });
  it('keeps depth charts readable: depth axis title with its unit', () => {
    const t = svgText(renderChartSvg(profile));
    expect(t).toContain('Depth (m)');
    expect(t).toContain('Temperature (°C)');
  });
});

describe('chart data CSV', () => {
  it('holds the plotted values with units in the header', () => {
    expect(chartCsv(twoCurves).split('\r\n')).toEqual([
      'Time (s),Benjamin (1968) (m),Shin et al. (2004) (m)',
      '0,0,0',
      '60,30,27',
      '120,58,52',
      '180,85,76',
      '',
    ]);
  });
});
