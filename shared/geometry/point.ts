/** A planar point [x, y] in design units; origin top-left, x to the right, y down (toward the quilter). */
export type Point = readonly [number, number];

/** An open polyline: at least two points, in drawing order. */
export type Polyline = readonly Point[];
