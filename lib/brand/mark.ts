/**
 * Chillwright's mark, drawn once: a dial whose scale is a slice of heat-exchanger core (two curved
 * tubes with a corrugated fin between them) and a needle resting at the cold end of the scale.
 *
 * The header component, the SVG favicon and the PNG icons made by `scripts/icons.ts` all take their
 * shapes from here, so there is one drawing to change.
 */

/** The drawing's coordinate box: 48 × 48 units. */
export const MARK_VIEWBOX = 48;

export type MarkTone = "onLight" | "onDark";

/** Colours from our palette (tailwind.config.ts, glacier scale) for each kind of background. */
export const MARK_TONES: Record<MarkTone, { tubes: string; fin: string; needle: string; halo: string }> = {
  onLight: { tubes: "#05476b", fin: "#0a6fa6", needle: "#022436", halo: "#ffffff" },
  onDark: { tubes: "#c6e6f6", fin: "#6cc0ea", needle: "#ffffff", halo: "#022436" },
};

/** The background the home-screen icons are drawn on (glacier-900). */
export const MARK_TILE_COLOUR = "#022436";

const CENTRE_X = 24;
const CENTRE_Y = 27.5;
const OUTER_R = 21;
const INNER_R = 10;
const TUBE = 3.6;
const SPAN_DEG = 250;
const FIN_PLEATS = 16;
const NEEDLE_DEG = 168;
const NEEDLE_TIP_R = 15.5;
export const NEEDLE_WIDTH = 3.8;
export const FIN_WIDTH = 2.3;
export const HUB_R = 4.6;

const START_DEG = 90 + (360 - SPAN_DEG) / 2;
const END_DEG = START_DEG + SPAN_DEG;

const n = (value: number) => Number(value.toFixed(2)).toString();
function at(r: number, deg: number): [number, number] {
  const rad = (deg * Math.PI) / 180;
  return [CENTRE_X + r * Math.cos(rad), CENTRE_Y + r * Math.sin(rad)];
}
function pt(r: number, deg: number) {
  const [x, y] = at(r, deg);
  return `${n(x)} ${n(y)}`;
}
function sector(innerR: number, outerR: number, fromDeg: number, toDeg: number) {
  const large = toDeg - fromDeg > 180 ? 1 : 0;
  return (
    `M${pt(outerR, fromDeg)}A${outerR} ${outerR} 0 ${large} 1 ${pt(outerR, toDeg)}` +
    `L${pt(innerR, toDeg)}A${innerR} ${innerR} 0 ${large} 0 ${pt(innerR, fromDeg)}Z`
  );
}

// The end walls are as thick as the tubes where they meet the inner tube.
const WALL_DEG = ((TUBE / (INNER_R + TUBE)) * 180) / Math.PI;
const WINDOW_FROM = START_DEG + WALL_DEG;
const WINDOW_TO = END_DEG - WALL_DEG;

/** The whole dial band, window included: the halo is drawn around it. */
const MARK_BAND_PATH = sector(INNER_R, OUTER_R, START_DEG, END_DEG);

/** The two curved tubes and the end walls: one shape with a window cut out (fill-rule evenodd). */
export const MARK_TUBES_PATH =
  MARK_BAND_PATH + sector(INNER_R + TUBE, OUTER_R - TUBE, WINDOW_FROM, WINDOW_TO);

/** The corrugated fin: a zigzag touching the inner and the outer tube in turn. */
export const MARK_FIN_PATH = Array.from({ length: FIN_PLEATS + 1 }, (_, i) => {
  const deg = WINDOW_FROM + ((WINDOW_TO - WINDOW_FROM) * i) / FIN_PLEATS;
  const r = i % 2 === 0 ? INNER_R + TUBE - 0.5 : OUTER_R - TUBE + 0.5;
  return `${i === 0 ? "M" : "L"}${pt(r, deg)}`;
}).join("");

/** The needle, from the hub to the cold end of the scale. */
export const MARK_NEEDLE_PATH = `M${n(CENTRE_X)} ${n(CENTRE_Y)}L${pt(NEEDLE_TIP_R, NEEDLE_DEG)}`;
export const MARK_HUB = { cx: CENTRE_X, cy: CENTRE_Y, r: HUB_R };

export interface MarkSvgOptions {
  /** Colours for a light or a dark background, or "auto" to follow the viewer's colour scheme. */
  tone: MarkTone | "auto";
  /** Fill the whole square with glacier-900 (home-screen icons, which the phone crops to its own shape). */
  tile?: boolean;
  /** How much of the square the drawing takes, 0–1 (a maskable icon keeps to the middle 80 %). */
  scale?: number;
  /** Width and height attributes in pixels; left out, the SVG scales to its box. */
  sizePx?: number;
  /**
   * A thin rim in the opposite tone around the drawing, so a favicon still reads when the browser's tab
   * strip is dark while the page asks for light colours, or the other way round.
   */
  halo?: boolean;
}

const HALO = 3;

/** The mark as a standalone SVG document (favicon, and the source of the PNG icons). */
export function markSvg({ tone, tile = false, scale = 1, sizePx, halo = false }: MarkSvgOptions): string {
  const colours = MARK_TONES[tone === "auto" ? "onLight" : tone];
  const size = sizePx === undefined ? "" : ` width="${sizePx}" height="${sizePx}"`;
  const offset = n((MARK_VIEWBOX * (1 - scale)) / 2);
  const transform = scale === 1 ? "" : ` transform="translate(${offset} ${offset}) scale(${n(scale)})"`;
  const style =
    tone === "auto"
      ? `<style>@media (prefers-color-scheme: dark){.t{fill:${MARK_TONES.onDark.tubes}}` +
        `.f{stroke:${MARK_TONES.onDark.fin}}.n{stroke:${MARK_TONES.onDark.needle}}.h{fill:${MARK_TONES.onDark.needle}}` +
        `.o{fill:${MARK_TONES.onDark.halo};stroke:${MARK_TONES.onDark.halo}}}</style>`
      : "";
  const rim = halo
    ? `<g class="o" fill="${colours.halo}" stroke="${colours.halo}" stroke-linejoin="round" stroke-linecap="round">` +
      `<path d="${MARK_BAND_PATH}" stroke-width="${HALO}"/>` +
      `<path d="${MARK_NEEDLE_PATH}" stroke-width="${n(NEEDLE_WIDTH + HALO)}"/>` +
      `<circle cx="${n(MARK_HUB.cx)}" cy="${n(MARK_HUB.cy)}" r="${n(MARK_HUB.r + HALO / 2)}"/></g>`
    : "";
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${MARK_VIEWBOX} ${MARK_VIEWBOX}"${size}>`,
    style,
    tile ? `<rect width="${MARK_VIEWBOX}" height="${MARK_VIEWBOX}" fill="${MARK_TILE_COLOUR}"/>` : "",
    `<g${transform}>`,
    rim,
    `<path class="f" d="${MARK_FIN_PATH}" fill="none" stroke="${colours.fin}" stroke-width="${FIN_WIDTH}" stroke-linejoin="round"/>`,
    `<path class="t" d="${MARK_TUBES_PATH}" fill="${colours.tubes}" fill-rule="evenodd"/>`,
    `<path class="n" d="${MARK_NEEDLE_PATH}" stroke="${colours.needle}" stroke-width="${NEEDLE_WIDTH}" stroke-linecap="round"/>`,
    `<circle class="h" cx="${n(MARK_HUB.cx)}" cy="${n(MARK_HUB.cy)}" r="${n(MARK_HUB.r)}" fill="${colours.needle}"/>`,
    `</g>`,
    `</svg>`,
  ].join("");
}
