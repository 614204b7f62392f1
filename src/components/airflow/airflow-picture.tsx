import { useId } from "react";
import {
  describeAirflowPicture,
  type AirflowArrow,
  type AirflowPicture as AirflowPictureData,
  type DrawPointFt,
  type LegendEntry,
  type PictureStyle,
  type Primitive,
} from "@shared/airflow";
import { cn } from "@/lib/cn";

export interface AirflowPictureProps {
  /** The picture built by `buildAirflowPicture` in shared/airflow. */
  picture: AirflowPictureData;
  /** Short name of the picture, e.g. "Airflow in the main attic today". */
  title: string;
  className?: string;
}

/**
 * Colours per style token. Meaning never rests on colour: flows differ by dash and arrowhead,
 * vents by shape and label, so the picture reads the same in greyscale.
 */
const STROKE: Record<PictureStyle, string> = {
  intended: "stroke-info-600",
  "short-circuit": "stroke-critical-600",
  blocked: "stroke-warning-700",
  "roof-deck": "stroke-ink-900",
  ceiling: "stroke-ink-600",
  wall: "stroke-ink-600",
  "gable-wall": "stroke-none",
  insulation: "stroke-warning-600",
  house: "stroke-none",
  "intake-vent": "stroke-ink-800",
  "exhaust-vent": "stroke-ink-800",
  fan: "stroke-ink-900",
};

const FILL: Record<PictureStyle, string> = {
  intended: "fill-info-600",
  "short-circuit": "fill-critical-600",
  blocked: "fill-warning-100",
  "roof-deck": "fill-ink-900",
  ceiling: "fill-ink-600",
  wall: "fill-ink-600",
  "gable-wall": "fill-ink-100",
  insulation: "fill-warning-100",
  house: "fill-ink-25",
  "intake-vent": "fill-white",
  "exhaust-vent": "fill-white",
  fan: "fill-white",
};

const TEXT: Partial<Record<PictureStyle, string>> = {
  "short-circuit": "fill-critical-800",
  blocked: "fill-warning-800",
  insulation: "fill-warning-800",
  house: "fill-ink-500",
};

const pointsAttr = (points: ReadonlyArray<DrawPointFt>) => points.map(([x, y]) => `${x},${y}`).join(" ");

function PrimitiveShape({ primitive, style, strokeWidthFt }: { primitive: Primitive; style: PictureStyle; strokeWidthFt: number }) {
  const stroke = strokeWidthFt > 0 ? STROKE[style] : "stroke-none";
  const common = { strokeWidth: strokeWidthFt, strokeLinejoin: "round" as const, strokeLinecap: "round" as const };
  if (primitive.type === "polyline") return <polyline points={pointsAttr(primitive.pointsFt)} className={cn("fill-none", stroke)} {...common} />;
  const fill = primitive.isFilled ? FILL[style] : "fill-none";
  if (primitive.type === "polygon") return <polygon points={pointsAttr(primitive.pointsFt)} className={cn(fill, stroke)} {...common} />;
  return <circle cx={primitive.centerFt[0]} cy={primitive.centerFt[1]} r={primitive.radiusFt} className={cn(fill, stroke)} {...common} />;
}

function Arrow({ arrow, unitFt }: { arrow: AirflowArrow; unitFt: number }) {
  const stroke = STROKE[arrow.style];
  return (
    <g>
      {/* A white casing keeps each arrow readable where it crosses lines and fills. */}
      <polyline
        points={pointsAttr(arrow.pointsFt)}
        className="fill-none stroke-white"
        strokeWidth={arrow.strokeWidthFt + 0.35 * unitFt}
        strokeLinecap="round"
        strokeLinejoin="round"
        opacity={0.85}
      />
      <polyline
        points={pointsAttr(arrow.pointsFt)}
        className={cn("fill-none", stroke)}
        strokeWidth={arrow.strokeWidthFt}
        strokeDasharray={arrow.dashFt.length > 0 ? arrow.dashFt.join(" ") : undefined}
        strokeLinecap="round"
        strokeLinejoin="round"
      />
      {arrow.head.kind === "filled-triangle" ? (
        <polygon points={pointsAttr(arrow.head.pointsFt)} className={cn(FILL[arrow.style], stroke)} strokeWidth={arrow.strokeWidthFt * 0.5} strokeLinejoin="round" />
      ) : arrow.head.kind === "open-chevron" ? (
        <polyline points={pointsAttr(arrow.head.pointsFt)} className={cn("fill-none", stroke)} strokeWidth={arrow.strokeWidthFt * 1.1} strokeLinejoin="miter" strokeLinecap="square" />
      ) : (
        <polyline points={pointsAttr(arrow.head.pointsFt)} className={cn("fill-none", stroke)} strokeWidth={arrow.strokeWidthFt * 1.6} strokeLinecap="butt" />
      )}
      {arrow.kind === "short-circuit-path" ? (
        <g>
          <circle cx={arrow.tagAtFt[0]} cy={arrow.tagAtFt[1]} r={1 * unitFt} className="fill-white stroke-critical-600" strokeWidth={0.22 * unitFt} />
          <text
            x={arrow.tagAtFt[0]}
            y={arrow.tagAtFt[1] + 0.42 * unitFt}
            textAnchor="middle"
            fontSize={1.2 * unitFt}
            fontWeight={700}
            className="fill-critical-800"
          >
            {arrow.tag}
          </text>
        </g>
      ) : null}
    </g>
  );
}

function LegendSample({ entry }: { entry: LegendEntry }) {
  const colour = { intended: "text-info-600", "short-circuit": "text-critical-600", blocked: "text-warning-700" }[entry.style];
  const dash = entry.line === "dashed" ? "7 4" : entry.line === "dotted" ? "0.5 4" : undefined;
  return (
    <svg viewBox="0 0 48 16" className={cn("h-4 w-12 shrink-0", colour)} aria-hidden="true" focusable="false">
      <line x1="2" y1="8" x2={entry.head === "filled-triangle" ? 36 : 42} y2="8" stroke="currentColor" strokeWidth="2.5" strokeDasharray={dash} strokeLinecap="round" />
      {entry.head === "filled-triangle" ? <polygon points="36,3 45,8 36,13" fill="currentColor" /> : null}
      {entry.head === "open-chevron" ? <polyline points="36,3 45,8 36,13" fill="none" stroke="currentColor" strokeWidth="2.5" /> : null}
      {entry.head === "stop-bar" ? <line x1="44" y1="2" x2="44" y2="14" stroke="currentColor" strokeWidth="3.5" /> : null}
    </svg>
  );
}

/**
 * The attic's airflow as an accessible SVG cross-section with its legend and notes below. The
 * drawing comes entirely from the picture data, so the PDF (react-pdf) shows the same thing.
 */
export function AirflowPicture({ picture, title, className }: AirflowPictureProps) {
  const id = useId();
  const titleId = `${id}-title`;
  const descId = `${id}-desc`;
  const u = picture.unitFt;
  const { minXFt, minYFt, widthFt, heightFt } = picture.viewBox;
  const shortCircuits = picture.captions.filter((c) => c.style === "short-circuit");
  const flowCaptions = picture.captions.filter((c) => c.style === "intended" || c.style === "blocked");
  const notes = picture.captions.filter((c) => c.style === "note");

  return (
    <figure className={cn("w-full space-y-3", className)}>
      <svg
        viewBox={`${minXFt} ${minYFt} ${widthFt} ${heightFt}`}
        width="100%"
        role="img"
        aria-labelledby={`${titleId} ${descId}`}
        className="mx-auto block h-auto w-full max-w-[40rem] select-none font-sans"
        preserveAspectRatio="xMidYMid meet"
      >
        <title id={titleId}>{title}</title>
        <desc id={descId}>{describeAirflowPicture(picture)}</desc>
        <rect x={minXFt} y={minYFt} width={widthFt} height={heightFt} className="fill-white" />
        {picture.shapes.map((shape) => (
          <g key={shape.id} data-kind={shape.kind}>
            {shape.parts.map((part, i) => (
              <PrimitiveShape key={i} primitive={part} style={shape.style} strokeWidthFt={shape.strokeWidthFt} />
            ))}
          </g>
        ))}
        {picture.arrows.map((arrow) => (
          <Arrow key={arrow.id} arrow={arrow} unitFt={u} />
        ))}
        {picture.texts.map((text) => (
          <text
            key={text.id}
            x={text.atFt[0]}
            y={text.atFt[1]}
            textAnchor={text.anchor}
            fontSize={text.fontSizeFt}
            fontWeight={text.isBold ? 600 : 400}
            className={cn("stroke-white", TEXT[text.style] ?? "fill-ink-900")}
            strokeWidth={0.35 * u}
            strokeLinejoin="round"
            paintOrder="stroke"
          >
            {text.text}
          </text>
        ))}
      </svg>
      <figcaption className="space-y-3 text-sm text-ink-700">
        <ul className="flex flex-col gap-1.5" aria-label="Legend">
          {picture.legend.map((entry) => (
            <li key={entry.style} className="flex items-start gap-2">
              <span className="mt-0.5">
                <LegendSample entry={entry} />
              </span>
              <span>{entry.words}</span>
            </li>
          ))}
        </ul>
        {flowCaptions.length > 0 || shortCircuits.length > 0 ? (
          <ul className="space-y-2 border-t border-ink-100 pt-3">
            {flowCaptions.map((caption) => (
              <li key={caption.id} className={cn(caption.style === "blocked" && "font-medium text-warning-800")}>
                {caption.text}
              </li>
            ))}
            {shortCircuits.map((caption) => (
              <li key={caption.id} className="flex items-start gap-2">
                <span
                  className="mt-0.5 inline-flex size-6 shrink-0 items-center justify-center rounded-full border-2 border-critical-600 bg-white text-xs font-bold text-critical-800"
                  aria-hidden="true"
                >
                  {caption.tag}
                </span>
                <span>
                  <span className="font-semibold text-critical-800">
                    Short-circuit {caption.tag}: {caption.findingTitle}.
                  </span>{" "}
                  {caption.sentence ?? caption.text}
                </span>
              </li>
            ))}
          </ul>
        ) : null}
        {notes.length > 0 ? (
          <ul className="space-y-1 text-xs text-ink-600">
            {notes.map((note) => (
              <li key={note.id}>{note.text}</li>
            ))}
          </ul>
        ) : null}
      </figcaption>
    </figure>
  );
}
