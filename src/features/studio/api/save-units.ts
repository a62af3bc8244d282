import type { MeDto, UnitSystem } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';

/** Keeps the user's unit choice (mm or in) on their account: PATCH /api/auth/me {units}. */
export const saveUnits = (units: UnitSystem) => api.patch<MeDto>('/api/auth/me', { units });
