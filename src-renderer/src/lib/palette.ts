/**
 * Colours of charts and drawings: the Okabe–Ito set, distinguishable with the common colour-vision
 * deficiencies; every series also has its own dash pattern and point shape so it survives grayscale.
 */
export const SERIES_COLOURS = ['#0072B2', '#D55E00', '#009E73', '#CC79A7', '#E69F00', '#56B4E9', '#000000'];
export const SERIES_DASHES: number[][] = [[], [6, 3], [2, 2], [8, 3, 2, 3], [4, 4], [1, 3], [10, 2]];
export const SERIES_POINTS = ['circle', 'rect', 'triangle', 'rectRot', 'crossRot', 'star', 'line'] as const;

export function seriesStyle(i: number) {
  return {
    colour: SERIES_COLOURS[i % SERIES_COLOURS.length],
    dash: SERIES_DASHES[i % SERIES_DASHES.length],
    point: SERIES_POINTS[i % SERIES_POINTS.length],
  };
}
