import { z } from 'zod';
import type { DriverParamsDto } from '../../../shared/schemas/api.schema.js';
import { parseCsvTable, type CsvTableSpec } from './csv-table.js';

/** Our own drivers' parameters columns. */
export const DRIVER_CSV_COLUMNS = ['name', 'cutout_diameter_mm', 'displacement_litres', 'cone_area_cm2', 'excursion_mm'] as const;

const positive = (what: string, max: number) =>
  z.number({ error: `${what} must be a number` }).gt(0, `${what} must be greater than 0`).max(max, `${what} must be at most ${max}`);

const driverRow = z.object({
  name: z.string().trim().min(1, 'name is required').max(120, 'name must be at most 120 characters'),
  cutoutDiameterMm: positive('cut-out diameter', 1000),
  displacementLitres: z.number({ error: 'displacement must be a number' }).min(0, 'displacement must be 0 or more').max(100, 'displacement must be at most 100 litres'),
  coneAreaCm2: positive('cone area', 10_000),
  excursionMm: positive('excursion', 100),
}) satisfies z.ZodType<DriverParamsDto>;

const DRIVER_CSV: CsvTableSpec<DriverParamsDto> = {
  columns: DRIVER_CSV_COLUMNS,
  required: DRIVER_CSV_COLUMNS,
  numeric: ['cutout_diameter_mm', 'displacement_litres', 'cone_area_cm2', 'excursion_mm'],
  fieldOf: {
    name: 'name',
    cutout_diameter_mm: 'cutoutDiameterMm',
    displacement_litres: 'displacementLitres',
    cone_area_cm2: 'coneAreaCm2',
    excursion_mm: 'excursionMm',
  },
  schema: driverRow,
  maxRows: 1000,
};

export function parseDriversCsv(text: string) {
  return parseCsvTable(text, DRIVER_CSV);
}
