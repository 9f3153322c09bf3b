/**
 * Properties of a rectangular or square HSS from its dimensions: outside H x B, design wall t,
 * outside corner radius 2t and inside radius t (the corner geometry the published HSS properties
 * assume [mem]). The engine reads catalog HSS from the table; this is the oracle the tests hold
 * the table against. Internal units: in.
 */
export interface BoxProps {
  A: number;
  Ix: number;
  Sx: number;
  Zx: number;
  Iy: number;
  ry: number;
  J: number;
}

/** Area, second moment about the centroidal axis parallel to `width`, and first moment of half. */
function roundedRect(width: number, height: number, r: number): { A: number; I: number; Qhalf: number } {
  const c = height / 2 - r; // level of the corner circles' centres
  const corner = (1 - Math.PI / 4) * r * r;
  const squareI = (r * ((c + r) ** 3 - c ** 3)) / 3;
  const quarterI = (Math.PI * r ** 4) / 16 + (2 * c * r ** 3) / 3 + (c * c * Math.PI * r * r) / 4;
  const squareQ = (r * ((c + r) ** 2 - c * c)) / 2;
  const quarterQ = (c * Math.PI * r * r) / 4 + r ** 3 / 3;
  return {
    A: width * height - 4 * corner,
    I: (width * height ** 3) / 12 - 4 * (squareI - quarterI),
    Qhalf: (width * (height / 2) ** 2) / 2 - 2 * (squareQ - quarterQ),
  };
}

/** @param H depth (bending about x), @param B width, @param t design wall thickness. */
export function boxSectionProps(H: number, B: number, t: number): BoxProps {
  const ro = 2 * t;
  const ri = t;
  const outX = roundedRect(B, H, ro);
  const inX = roundedRect(B - 2 * t, H - 2 * t, ri);
  const outY = roundedRect(H, B, ro);
  const inY = roundedRect(H - 2 * t, B - 2 * t, ri);
  const A = outX.A - inX.A;
  const Ix = outX.I - inX.I;
  const Iy = outY.I - inY.I;
  // Torsion of a closed thin wall (Bredt): J = 4 Ap^2 t / p on the wall's mid-line, corner radius 1.5t.
  const rm = 1.5 * t;
  const Ap = (B - t) * (H - t) - (4 - Math.PI) * rm * rm;
  const p = 2 * (B - t) + 2 * (H - t) - 2 * (4 - Math.PI) * rm;
  return {
    A,
    Ix,
    Sx: (2 * Ix) / H,
    Zx: 2 * (outX.Qhalf - inX.Qhalf),
    Iy,
    ry: Math.sqrt(Iy / A),
    J: (4 * Ap * Ap * t) / p,
  };
}

/** Round HSS or pipe from outside diameter D and design wall t. */
export function pipeSectionProps(D: number, t: number): BoxProps {
  const d = D - 2 * t;
  const A = (Math.PI / 4) * (D * D - d * d);
  const I = (Math.PI / 64) * (D ** 4 - d ** 4);
  return { A, Ix: I, Sx: (2 * I) / D, Zx: (D ** 3 - d ** 3) / 6, Iy: I, ry: Math.sqrt(I / A), J: 2 * I };
}
