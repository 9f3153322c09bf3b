/**
 * The shop sketch as data: what is drawn where, in drawing units (the SVG's user space, y down), so
 * that the component only renders and the tests can read every dimension without a browser.
 */
export interface Pt {
  x: number;
  y: number;
}

export interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/** ink: ordinary; warn: a rod off the pier or too near an edge (drawn red, with words); muted: notes. */
export type Tone = 'ink' | 'warn' | 'muted';

export interface Label {
  text: string;
  /** Anchor point of the text: the baseline (rotated with the text when vertical). */
  x: number;
  y: number;
  anchor: 'start' | 'middle' | 'end';
  /** Reads bottom to top (a dimension along a vertical line). */
  vertical: boolean;
  tone: Tone;
  /** Estimated box of the text, for keeping labels apart and off the plate. */
  box: Box;
}

export interface Dimension {
  /** Stable id, e.g. plate.N, rod.plateEdge.N.tension. */
  id: string;
  /** What is measured, in words (the dimension table's first column). */
  what: string;
  /** The measured length, in. */
  inches: number;
  /** The value as written on the drawing. */
  text: string;
  tone: Tone;
  /** The least value the layout needs (in) where a minimum applies. */
  minimum?: number;
  /** Words for a dimension that fails its minimum ("outside the pier", "edge 1-1/2 in < 3 in min"). */
  problem?: string;
  line: [Pt, Pt];
  ext: [Pt, Pt][];
  label: Label;
  /** A line from the dimension to a label that had to move aside. */
  leader: [Pt, Pt] | null;
}

export type ShapeRole =
  | 'pier'
  | 'plate'
  | 'steel'
  | 'steel-void'
  | 'bearing'
  | 'grout'
  | 'washer'
  | 'nut'
  | 'head'
  | 'hole'
  | 'rod-tension'
  | 'rod-compression'
  | 'rod'
  | 'rod-side'
  | 'warn-ring'
  | 'centre-line'
  | 'break';

export type Shape =
  | { kind: 'rect'; role: ShapeRole; box: Box }
  | { kind: 'circle'; role: ShapeRole; cx: number; cy: number; r: number }
  | { kind: 'path'; role: ShapeRole; d: string };

export interface Callout {
  from: Pt;
  to: Pt;
  labels: Label[];
}

export interface DrawingView {
  id: 'plan' | 'face' | 'section';
  title: string;
  width: number;
  height: number;
  shapes: Shape[];
  dims: Dimension[];
  callouts: Callout[];
  /** Free text: orientation and, in red, every rod off the pier or too near an edge. */
  notes: Label[];
  /** Boxes no label may overlap (the plate, in every view). */
  keepClear: Box[];
}

export function boxesOverlap(a: Box, b: Box): boolean {
  return a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
}
