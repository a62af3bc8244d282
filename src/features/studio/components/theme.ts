/**
 * Canvas colours: warm greys for wood and walls, a straw tone for the lining, slate for cut-outs, the
 * app's teal accent for the selection and an amber-red for warnings. Our own palette.
 */
import type { Role } from '../model/views';

export const INK = '#3f3b36';
export const MUTED = '#8a847b';
export const ACCENT = '#12736e';
export const ACCENT_SOFT = 'rgba(18, 115, 110, 0.14)';
export const WARN = '#b4461b';
export const CANVAS_BG = '#f6f5f2';

export interface RoleStyle {
  fill?: string;
  stroke: string;
  strokeWidth: number;
}

export const ROLE_STYLE: Record<Role, RoleStyle> = {
  outline: { fill: '#ebe7df', stroke: INK, strokeWidth: 1.25 },
  wall: { fill: '#d8d2c6', stroke: INK, strokeWidth: 1.25 },
  cavity: { fill: '#fdfcfa', stroke: '#7d766c', strokeWidth: 1 },
  lining: { fill: 'rgba(222, 190, 110, 0.35)', stroke: '#c7a350', strokeWidth: 0.75 },
  brace: { fill: '#c9b58f', stroke: '#5e4e33', strokeWidth: 1 },
  bar: { fill: '#c9b58f', stroke: '#5e4e33', strokeWidth: 1 },
  window: { fill: '#fdfcfa', stroke: '#5e4e33', strokeWidth: 0.75 },
  driver: { fill: 'rgba(60, 72, 88, 0.10)', stroke: '#3c4858', strokeWidth: 1.25 },
  rebate: { fill: 'rgba(60, 72, 88, 0.05)', stroke: '#6b7685', strokeWidth: 0.75 },
  screw: { fill: '#fdfcfa', stroke: '#3c4858', strokeWidth: 0.75 },
  port: { fill: '#fdfcfa', stroke: '#35536e', strokeWidth: 1 },
  tube: { fill: '#b7c6d4', stroke: '#35536e', strokeWidth: 1 },
  terminal: { fill: '#e3e6ea', stroke: '#4a5563', strokeWidth: 1 },
  lead: { fill: '#e3e6ea', stroke: '#4a5563', strokeWidth: 1 },
  gap: { fill: '#fdfcfa', stroke: '#3c4858', strokeWidth: 1 },
  edge: { stroke: 'rgba(0,0,0,0)', strokeWidth: 1 },
};
