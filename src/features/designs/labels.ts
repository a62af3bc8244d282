/** Words the design form shows for faces, axes and items: plain trade terms (PRODUCT.md §10). */
import { FACE_PANEL_NAMES } from '../../../shared/cabinet/panels';
import type { Axis, FacePair } from '../../../shared/schemas/design.schema';

/** The same names the plan gives the panels ("Front (baffle)", "Left side", …). */
export const FACE_LABELS = FACE_PANEL_NAMES;

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
