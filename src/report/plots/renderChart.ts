/**
 * Render one chart headlessly: a Vega-Lite specification is compiled to Vega, run in a Vega
 * view with no renderer (`renderer: 'none'`), drawn to an SVG string (`view.toSVG()`), and
 * the SVG is rasterised to PNG by resvg at a fixed pixel width.
 *
 * Same specification → byte-identical SVG and PNG, on one machine and on machines with the
 * same font file:
 * - text is laid out by Vega's own width estimate (0.8 × font size per character), never by a
 *   canvas measuring system fonts, so an optional canvas package cannot change the layout;
 * - Vega numbers its SVG clip paths and gradients from module-wide counters; they are reset
 *   before every render, and renders run one at a time so no other render moves them;
 * - resvg reads only the font files named here (no system font scan), and they come from an
 *   npm package pinned in the lockfile (dejavu-fonts-ttf, DejaVu 2.37), not from the
 *   system: a machine's own fonts (Debian's DejaVu build differs byte for byte from this
 *   one) never change the PNG, and a machine without fonts installed renders the same. A
 *   missing font file is an error, not a silent fallback.
 * - Data are inline only: any attempt to load a URL or file is refused (no network at run time).
 */
import { existsSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { TopLevelSpec } from 'vega-lite';

type VegaModule = typeof import('vega');
type VegaLiteCompile = typeof import('vega-lite').compile;
type ResvgClass = typeof import('@resvg/resvg-js').Resvg;

interface ChartLibraries {
  vega: VegaModule;
  compile: VegaLiteCompile;
  Resvg: ResvgClass;
}

let libraries: Promise<ChartLibraries> | null = null;

/**
 * Vega, Vega-Lite and resvg, loaded on the first render only: loading them takes most of a
 * second, which every command paid at start-up before, charts or not (measured: `--version`
 * 1.75–1.83 s at load average 9, of it vega 0.4 s and vega-lite 0.46 s to import).
 */
function chartLibraries(): Promise<ChartLibraries> {
  libraries ??= Promise.all([import('vega'), import('vega-lite'), import('@resvg/resvg-js')])
    .then(([vega, vegaLite, resvg]) => ({ vega, compile: vegaLite.compile, Resvg: resvg.Resvg }));
  return libraries;
}

/** The one font family of every chart (DejaVu: free, wide Unicode cover including Greek). */
export const CHART_FONT_FAMILY = 'DejaVu Sans';

const requireFromHere = createRequire(import.meta.url);

/** The font files resvg loads for CHART_FONT_FAMILY: regular (labels) and bold (titles). */
export const CHART_FONT_FILES: readonly string[] = [
  requireFromHere.resolve('dejavu-fonts-ttf/ttf/DejaVuSans.ttf'),
  requireFromHere.resolve('dejavu-fonts-ttf/ttf/DejaVuSans-Bold.ttf'),
];

/** PNG width in pixels unless the caller asks for another; the height follows the SVG's aspect. */
export const DEFAULT_PNG_WIDTH_PX = 1200;

export interface RenderedChart {
  svg: string;
  png: Buffer;
}

export interface RenderOptions {
  pngWidthPx?: number; // default DEFAULT_PNG_WIDTH_PX
  fontFiles?: readonly string[]; // default CHART_FONT_FILES
}

/** Vega's text metrics switch; present at run time, missing from Vega's type declarations. */
interface TextMetricsSwitch {
  canvas(use: boolean): void;
}

/** A loader that refuses every load: chart data are inline, nothing is fetched or read. */
function refusingLoader(vega: VegaModule): ReturnType<VegaModule['loader']> {
  const refuse = async (uri: string): Promise<never> => {
    throw new TypeError(`chart specification asks to load "${uri}": chart data must be inline`);
  };
  const base = vega.loader();
  return Object.assign(base, { load: refuse, sanitize: refuse, http: refuse, file: refuse });
}

/** Fixed configuration set over the caller's: one font family everywhere, white background. */
function withFixedConfig(spec: TopLevelSpec): TopLevelSpec {
  const config = { ...(spec.config ?? {}), font: CHART_FONT_FAMILY, background: 'white' };
  return { ...spec, config } as TopLevelSpec;
}

let queue: Promise<unknown> = Promise.resolve();

/** Run renders one at a time (Vega's SVG id counters are module-wide). */
function serialised<T>(task: () => Promise<T>): Promise<T> {
  const run = queue.then(task, task);
  queue = run.catch(() => undefined);
  return run;
}

/** The first data URL anywhere in a compiled Vega specification, or '' (Vega data: `{ name, url }`). */
function firstDataUrl(node: unknown): string {
  if (Array.isArray(node)) {
    for (const item of node) {
      const url = firstDataUrl(item);
      if (url) return url;
    }
  } else if (node !== null && typeof node === 'object') {
    const obj = node as Record<string, unknown>;
    if (typeof obj.url === 'string' && typeof obj.name === 'string') return obj.url;
    for (const key of Object.keys(obj)) {
      const url = firstDataUrl(obj[key]);
      if (url) return url;
    }
  }
  return '';
}

async function specToSvg(spec: TopLevelSpec, { vega, compile }: ChartLibraries): Promise<string> {
  const vgSpec = compile(withFixedConfig(spec)).spec;
  // Vega only logs a failed load and draws no data, so a data URL is refused here, loudly;
  // the refusing loader stays as a backstop for anything else that would load.
  const url = firstDataUrl(vgSpec.data);
  if (url) throw new TypeError(`chart specification asks to load "${url}": chart data must be inline`);
  (vega as unknown as { textMetrics: TextMetricsSwitch }).textMetrics.canvas(false);
  const view = new vega.View(vega.parse(vgSpec), { renderer: 'none', loader: refusingLoader(vega) });
  try {
    await view.runAsync();
    vega.resetSVGDefIds();
    return await view.toSVG();
  } finally {
    view.finalize();
  }
}

function svgToPng(svg: string, pngWidthPx: number, fontFiles: readonly string[], Resvg: ResvgClass): Buffer {
  for (const f of fontFiles) {
    if (!existsSync(f)) throw new Error(`chart font file not found: ${f}`);
  }
  const resvg = new Resvg(svg, {
    fitTo: { mode: 'width', value: pngWidthPx },
    font: { loadSystemFonts: false, fontFiles: [...fontFiles], defaultFontFamily: CHART_FONT_FAMILY },
  });
  return resvg.render().asPng();
}

/** Render a Vega-Lite specification with inline data to SVG text and a PNG `pngWidthPx` wide. */
export function renderChart(spec: TopLevelSpec, opts: RenderOptions = {}): Promise<RenderedChart> {
  const pngWidthPx = opts.pngWidthPx ?? DEFAULT_PNG_WIDTH_PX;
  if (!Number.isInteger(pngWidthPx) || pngWidthPx < 16 || pngWidthPx > 8192) {
    throw new RangeError(`pngWidthPx must be an integer in 16..8192, got ${pngWidthPx}`);
  }
  const fontFiles = opts.fontFiles ?? CHART_FONT_FILES;
  return serialised(async () => {
    const libs = await chartLibraries();
    const svg = await specToSvg(spec, libs);
    return { svg, png: svgToPng(svg, pngWidthPx, fontFiles, libs.Resvg) };
  });
}
