// Types for the area-polygon package (no published types), used only to cross-check the shoelace formula in tests.
declare module "area-polygon" {
  function areaPolygon(points: ReadonlyArray<readonly [number, number] | { x: number; y: number }>, signed?: boolean): number;
  export default areaPolygon;
}
