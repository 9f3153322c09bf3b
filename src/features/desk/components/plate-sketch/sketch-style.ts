/**
 * Colours of the shop sketch on screen, as SVG presentation attributes, so that the print sheet
 * (plate-sketch-print.css) wins over them.
 */
import type { ShapeRole, Tone } from '../../lib/plate-drawing-types';

export const INK = '#28251f';
export const TONE: Record<Tone, string> = { ink: INK, warn: '#b3261e', muted: '#5e574e' };

type Paint = { fill: string; stroke: string; strokeWidth: number; strokeDasharray?: string };

export function paint(role: ShapeRole, hatch: string, grout: string): Paint {
  switch (role) {
    case 'pier':
      return { fill: '#e4e0da', stroke: '#8a8175', strokeWidth: 1 };
    case 'plate':
      return { fill: '#f7f6f4', stroke: '#3d3935', strokeWidth: 1.6 };
    case 'steel':
      return { fill: '#fae1cf', stroke: '#a94714', strokeWidth: 1.2 };
    case 'steel-void':
      return { fill: '#f7f6f4', stroke: '#a94714', strokeWidth: 0.8 };
    case 'bearing':
      return { fill: `url(#${hatch})`, stroke: '#c8571b', strokeWidth: 1, strokeDasharray: '4 3' };
    case 'grout':
      return { fill: `url(#${grout})`, stroke: '#8a8175', strokeWidth: 0.8 };
    case 'washer':
      return { fill: '#eeece8', stroke: '#6b645a', strokeWidth: 0.9 };
    case 'nut':
    case 'head':
      return { fill: '#6b645a', stroke: INK, strokeWidth: 0.8 };
    case 'hole':
      return { fill: '#ffffff', stroke: '#3d3935', strokeWidth: 0.9 };
    case 'rod-tension':
      return { fill: '#873811', stroke: '#873811', strokeWidth: 1 };
    case 'rod-compression':
      return { fill: '#ffffff', stroke: INK, strokeWidth: 1.6 };
    case 'rod':
    case 'rod-side':
      return { fill: '#56504a', stroke: INK, strokeWidth: 0.6 };
    case 'warn-ring':
      return { fill: 'none', stroke: TONE.warn, strokeWidth: 2.2 };
    case 'centre-line':
      return { fill: 'none', stroke: '#8a8175', strokeWidth: 0.8, strokeDasharray: '14 3 3 3' };
    case 'break':
      return { fill: 'none', stroke: INK, strokeWidth: 1 };
  }
}
