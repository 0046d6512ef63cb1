/**
 * Chart rendering figures: for each chart builder at the most samples a chart draws (5 000,
 * after thinning from 20 000), the time to render (Vega-Lite → Vega → SVG → PNG) and the
 * SVG and PNG sizes. The first render of a process also loads the fonts and warms the
 * compilers, so it is reported apart. Figures only; nothing is asserted. Invented data.
 * Usage: npx tsx scripts/bench/plots.ts
 */
import type { TopLevelSpec } from 'vega-lite';
import {
  renderChart, resonantAngleChart, rotatingFrameChart, scatterMapChart,
} from '../../src/report/plots/index.js';

const N = 20_000;
const t = Float64Array.from({ length: N }, (_, i) => i * 0.01); // 200 years
const wrap = (deg: number) => { const p = ((((deg + 180) % 360) + 360) % 360) - 180; return p === -180 ? 180 : p; };
const phi = Float64Array.from(t, (y) => wrap(y < 100 ? 60 + 30 * Math.sin(y / 4) : 60 + 9 * y));
const ang = Float64Array.from(t, (y) => y * 2 * Math.PI);

const charts: Array<[string, () => TopLevelSpec]> = [
  ['resonantAngle line', () => resonantAngleChart({
    designation: '2099 AB', planet: 'Earth', tYears: t, phiDeg: phi,
    bands: [{ startYears: 0, endYears: 100, state: 'tadpole-L4' }, { startYears: 100, endYears: 200, state: 'passing' }],
  })],
  ['resonantAngle points', () => resonantAngleChart({ designation: '2099 AB', planet: 'Earth', tYears: t, phiDeg: phi, style: 'points' })],
  ['rotatingFrame', () => rotatingFrameChart({
    designation: '2099 AB', planet: 'Earth', planetDistanceAu: 1,
    xAu: Float64Array.from(ang, (a) => (1 + 0.05 * Math.cos(a)) * Math.cos(0.003 * a)),
    yAu: Float64Array.from(ang, (a) => (1 + 0.05 * Math.cos(a)) * Math.sin(0.003 * a) + 0.1 * Math.sin(a)),
  })],
  ['scatterMap', () => scatterMapChart({
    title: 'proper elements', xTitle: 'proper a (au)', yTitle: 'proper e',
    x: Float64Array.from(t, (_, i) => 2 + ((i * 0.618034) % 1.3)),
    y: Float64Array.from(t, (_, i) => (i * 0.414214) % 0.35),
    category: Array.from(t, (_, i) => ['A', 'B', 'C', 'background'][i % 4]),
    highlight: Array.from(t, (_, i) => i % 500 === 0),
  })],
];

const warm = performance.now();
await renderChart(charts[0][1]());
console.log(`first render in this process (loads fonts, warms up): ${(performance.now() - warm).toFixed(0)} ms`);
const results: Record<string, Record<string, number>> = {};
for (const [name, build] of charts) {
  const times: number[] = [];
  let svgBytes = 0;
  let pngBytes = 0;
  for (let k = 0; k < 5; k++) {
    const start = performance.now();
    const { svg, png } = await renderChart(build());
    times.push(performance.now() - start);
    svgBytes = Buffer.byteLength(svg);
    pngBytes = png.length;
  }
  times.sort((a, b) => a - b);
  results[name] = { medianMs: Math.round(times[2]), minMs: Math.round(times[0]), maxMs: Math.round(times[4]), svgBytes, pngBytes };
  console.log(`${name}: median ${times[2].toFixed(0)} ms (5 renders ${times[0].toFixed(0)}–${times[4].toFixed(0)} ms), SVG ${svgBytes} B, PNG ${pngBytes} B`);
}
console.log(JSON.stringify(results, null, 2));
