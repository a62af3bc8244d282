/** Words the design form shows for faces, axes and items: plain trade terms (PRODUCT.md §10). */
import type { Axis, Face, FacePair } from '../../../shared/schemas/design.schema';

export const FACE_LABELS: Record<Face, string> = {
  front: 'Front (baffle)',
  back: 'Back',
  left: 'Left side',
  right: 'Right side',
  top: 'Top',
  bottom: 'Bottom',
};

/** A box coordinate, saying where it is measured from (origin: outer front-bottom-left corner). */
export const COORD_LABELS: Record<Axis, string> = {
  x: 'x, from left',
  y: 'y, from bottom',
  z: 'z, from front',
};

export const FACE_PAIR_LABELS: Record<FacePair, string> = {
  frontBack: 'Front and back',
  sides: 'Left and right sides',
  topBottom: 'Top and bottom',
};

/** A shelf brace lies across one axis: its plane is perpendicular to it. */
export const SHELF_AXIS_LABELS: Record<Axis, string> = {
  y: 'Horizontal (across y)',
  x: 'Upright, parallel to the sides (across x)',
  z: 'Upright, parallel to the baffle (across z)',
};

/** A bar brace runs along one axis from one inner face to the opposite one. */
export const BAR_AXIS_LABELS: Record<Axis, string> = {
  x: 'Side to side (along x)',
  y: 'Bottom to top (along y)',
  z: 'Front to back (along z)',
};

export const OPENING_LABELS = {
  driver: 'Driver',
  port: 'Port',
  terminal: 'Terminal',
  lead: 'Lead hole',
} as const;
