import {
  FIN_WIDTH,
  MARK_FIN_PATH,
  MARK_HUB,
  MARK_NEEDLE_PATH,
  MARK_TONES,
  MARK_TUBES_PATH,
  MARK_VIEWBOX,
  NEEDLE_WIDTH,
  type MarkTone,
} from "@/lib/brand/mark";

/**
 * Our mark: a dial whose scale is a slice of heat-exchanger core, the needle at the cold end.
 * Drawn once in lib/brand/mark.ts; the favicon and the home-screen icons come from the same drawing.
 * With a `label` it is an image with that name; without one it is decoration beside a visible name.
 */
export function BrandMark({
  className,
  tone = "onLight",
  label,
}: {
  className?: string;
  tone?: MarkTone;
  label?: string;
}) {
  const colours = MARK_TONES[tone];
  const named = label ? { role: "img", "aria-label": label } : { "aria-hidden": true as const };
  return (
    <svg viewBox={`0 0 ${MARK_VIEWBOX} ${MARK_VIEWBOX}`} className={className} focusable="false" {...named}>
      {label ? <title>{label}</title> : null}
      <path
        d={MARK_FIN_PATH}
        fill="none"
        stroke={colours.fin}
        strokeWidth={FIN_WIDTH}
        strokeLinejoin="round"
      />
      <path d={MARK_TUBES_PATH} fill={colours.tubes} fillRule="evenodd" />
      <path d={MARK_NEEDLE_PATH} stroke={colours.needle} strokeWidth={NEEDLE_WIDTH} strokeLinecap="round" />
      <circle cx={MARK_HUB.cx} cy={MARK_HUB.cy} r={MARK_HUB.r} fill={colours.needle} />
    </svg>
  );
}
