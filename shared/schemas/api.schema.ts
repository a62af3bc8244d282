/**
 * Request bodies and response DTOs of the HTTP API (PRODUCT.md §8), shared by client and server.
 */
import { z } from 'zod';
import { designSchema } from './design.schema.js';

export const ROLES = ['owner', 'designer', 'maker', 'viewer'] as const;
export type Role = (typeof ROLES)[number];
export const roleSchema = z.enum(ROLES, { error: 'role must be owner, designer, maker or viewer' });

export const emailSchema = z.string().trim().toLowerCase().email('enter a valid e-mail address').max(254);
export const passwordSchema = z.string().min(10, 'password must be at least 10 characters').max(200);

export const loginInput = z.object({ email: emailSchema, password: z.string().min(1, 'password is required') });
export type LoginInput = z.infer<typeof loginInput>;

export const signupInput = z.object({
  email: emailSchema,
  password: passwordSchema,
  workshopName: z.string().trim().min(1, 'workshop name is required').max(120),
});
export type SignupInput = z.infer<typeof signupInput>;

export const UNIT_SYSTEMS = ['mm', 'in'] as const;
export const preferencesInput = z.object({ units: z.enum(UNIT_SYSTEMS) });
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

export interface UserDto {
  id: number;
  email: string;
  units: UnitSystem;
}
export interface MembershipDto {
  workshopId: number;
  workshopName: string;
  role: Role;
}
export interface MeDto {
  user: UserDto;
  memberships: MembershipDto[];
}
export interface MemberDto {
  userId: number;
  email: string;
  role: Role;
}

export const memberRoleInput = z.object({ role: roleSchema });

/** Create: the design JSON itself. Update: the design with the version the client loaded. */
export const designCreateInput = designSchema;
export const designUpdateInput = z.object({
  version: z.number({ error: 'version is required' }).int().min(1),
  design: designSchema,
});
export type DesignUpdateInput = z.input<typeof designUpdateInput>;

export interface DesignSummaryDto {
  id: number;
  name: string;
  version: number;
  widthMm: number;
  heightMm: number;
  depthMm: number;
  braceCount: number;
  openingCount: number;
  createdAt: string;
  updatedAt: string;
  updatedBy: string | null;
}
export interface DesignDto {
  id: number;
  name: string;
  version: number;
  design: z.output<typeof designSchema>;
  createdAt: string;
  updatedAt: string;
  updatedBy: string | null;
}
export interface ListDto<T> {
  items: T[];
}

/** What each role may do (PRODUCT.md §2). The server enforces it; the client only hides controls. */
export const PERMISSIONS = {
  readDesigns: ['owner', 'designer', 'maker', 'viewer'],
  editDesigns: ['owner', 'designer'],
  runCutPlans: ['owner', 'designer', 'maker'],
  exportPlans: ['owner', 'designer', 'maker'],
  tickParts: ['owner', 'maker'],
  manageStock: ['owner', 'maker'],
  manageMembers: ['owner'],
  manageWorkshop: ['owner'],
} as const satisfies Record<string, readonly Role[]>;
export type Permission = keyof typeof PERMISSIONS;

export function can(role: Role | undefined | null, permission: Permission): boolean {
  return role != null && (PERMISSIONS[permission] as readonly Role[]).includes(role);
}
