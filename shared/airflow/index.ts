/**
 * The airflow picture's public face (DESIGN.md §4): built once as plain data here, drawn by the
 * client as SVG and by the PDF with react-pdf's SVG primitives.
 */
export { buildAirflowPicture } from "./build-airflow-picture";
export type { BuildAirflowPictureOptions } from "./build-airflow-picture";
export { describeAirflowPicture, joinPlaces } from "./describe-airflow-picture";
export { DASH_UNITS, MAX_SHORT_CIRCUITS } from "./flow-paths";
export type {
  AirflowArrow,
  AirflowPicture,
  ArrowHead,
  ArrowHeadKind,
  BlockedArrow,
  DrawPointFt,
  FlowStyle,
  HouseFanArrow,
  IntendedArrow,
  LegendEntry,
  LegendLine,
  PictureCaption,
  PictureShape,
  PictureStyle,
  PictureText,
  Primitive,
  ShapeKind,
  ShortCircuitArrow,
  StructureStyle,
  TextAnchor,
  ViewBoxFt,
} from "./types";
