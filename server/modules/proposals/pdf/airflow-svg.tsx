import { Circle, Polygon, Polyline, Svg, Text as SvgText, G } from "@react-pdf/renderer";
import type { AirflowPicture, DrawPointFt, PictureStyle, Primitive } from "../../../../shared/airflow/index.ts";
import { PLEX_FAMILIES } from "./fonts.ts";

/** Colours per style; meaning never rests on colour alone (dash patterns and heads differ too). */
const STROKE: Record<PictureStyle, string> = {
  intended: "#1d5fa8",
  "short-circuit": "#b4411b",
  blocked: "#6b6b6b",
  "roof-deck": "#3b3f46",
  ceiling: "#3b3f46",
  wall: "#3b3f46",
  "gable-wall": "#c9ccd1",
  insulation: "#c99a3e",
  house: "#e9ecef",
  "intake-vent": "#1f7a5c",
  "exhaust-vent": "#1f7a5c",
  fan: "#6a3fa0",
};
const FILL: Partial<Record<PictureStyle, string>> = { house: "#f1f3f5", "gable-wall": "#f7f7f8", insulation: "#f3dfb2" };

const pts = (points: readonly DrawPointFt[]) => points.map(([x, y]) => `${x.toFixed(3)},${y.toFixed(3)}`).join(" ");

function PrimitiveShape({ part, style, strokeWidthFt, dash }: { part: Primitive; style: PictureStyle; strokeWidthFt: number; dash?: string }) {
  const stroke = STROKE[style];
  const common = { stroke, strokeWidth: strokeWidthFt, ...(dash ? { strokeDasharray: dash } : {}) };
  if (part.type === "polyline") return <Polyline points={pts(part.pointsFt)} fill="none" {...common} />;
  if (part.type === "polygon") {
    return <Polygon points={pts(part.pointsFt)} fill={part.isFilled ? (FILL[style] ?? stroke) : "none"} {...common} strokeWidth={strokeWidthFt || 0} />;
  }
  return <Circle cx={part.centerFt[0]} cy={part.centerFt[1]} r={part.radiusFt} fill={part.isFilled ? stroke : "none"} {...common} />;
}

/** The shared airflow picture drawn with react-pdf's SVG primitives, as the client draws it with SVG. */
export function AirflowSvg({ picture, widthPt }: { picture: AirflowPicture; widthPt: number }) {
  const v = picture.viewBox;
  const heightPt = (widthPt * v.heightFt) / v.widthFt;
  return (
    <Svg width={widthPt} height={heightPt} style={{ flexShrink: 0 }} viewBox={`${v.minXFt} ${v.minYFt} ${v.widthFt} ${v.heightFt}`}>
      {picture.shapes.map((shape) => (
        <G key={shape.id}>
          {shape.parts.map((part, i) => (
            <PrimitiveShape key={i} part={part} style={shape.style} strokeWidthFt={shape.strokeWidthFt} />
          ))}
        </G>
      ))}
      {picture.arrows.map((arrow) => (
        <G key={arrow.id}>
          <Polyline
            points={pts(arrow.pointsFt)}
            fill="none"
            stroke={STROKE[arrow.style]}
            strokeWidth={arrow.strokeWidthFt}
            {...(arrow.dashFt.length ? { strokeDasharray: arrow.dashFt.map((d) => d.toFixed(3)).join(" ") } : {})}
          />
          {arrow.head.kind === "filled-triangle" ? (
            <Polygon points={pts(arrow.head.pointsFt)} fill={STROKE[arrow.style]} />
          ) : (
            <Polyline points={pts(arrow.head.pointsFt)} fill="none" stroke={STROKE[arrow.style]} strokeWidth={arrow.strokeWidthFt} />
          )}
          {/* The letter the caption under the picture names ("Short-circuit A — …"), as on screen. */}
          {arrow.kind === "short-circuit-path" ? (
            <G>
              <Circle cx={arrow.tagAtFt[0]} cy={arrow.tagAtFt[1]} r={picture.unitFt} fill="#ffffff" stroke={STROKE["short-circuit"]} strokeWidth={0.22 * picture.unitFt} />
              <SvgText
                x={arrow.tagAtFt[0]}
                y={arrow.tagAtFt[1] + 0.42 * picture.unitFt}
                textAnchor="middle"
                fill={STROKE["short-circuit"]}
                style={{ fontSize: 1.2 * picture.unitFt, fontFamily: PLEX_FAMILIES, fontWeight: 700 }}
              >
                {arrow.tag}
              </SvgText>
            </G>
          ) : null}
        </G>
      ))}
      {picture.texts.map((text) => (
        <SvgText
          key={text.id}
          x={text.atFt[0]}
          y={text.atFt[1]}
          textAnchor={text.anchor}
          fill={STROKE[text.style] === STROKE.house ? "#3b3f46" : STROKE[text.style]}
          style={{ fontSize: text.fontSizeFt, fontFamily: PLEX_FAMILIES, fontWeight: text.isBold ? 700 : 400 }}
        >
          {text.text}
        </SvgText>
      ))}
    </Svg>
  );
}
