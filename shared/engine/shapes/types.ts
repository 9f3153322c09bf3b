/** A shape of the open shapes table, with the published database's column names (in, in^2, in^4 …). */
export type ShapeFamily = 'W' | 'HSS' | 'PIPE' | 'C';

export interface ShapeRecord {
  label: string;
  family: ShapeFamily;
  /** Nominal weight, lb/ft. */
  W: number;
  A: number;
  d?: number;
  bf?: number;
  tf?: number;
  tw?: number;
  kdes?: number;
  Ht?: number;
  B?: number;
  tdes?: number;
  OD?: number;
  Ix: number;
  Zx: number;
  Sx: number;
  rx?: number;
  Iy: number;
  Zy?: number;
  Sy?: number;
  ry: number;
  J: number;
  Cw?: number;
  rts?: number;
  ho?: number;
  x?: number;
  eo?: number;
  /** True for a shape a user imported rather than the published table. */
  custom?: boolean;
}

/** Finds a shape by its label (case-insensitive, "x" or "X"). */
export type ShapeLookup = (label: string) => ShapeRecord | undefined;
