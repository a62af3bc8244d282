/**
 * Request bodies and response DTOs of the HTTP API (PRODUCT.md §8), shared by client and server.
 */
import { z } from 'zod';
import { designSchema } from './design.schema.js';
import type { Layout } from './nest.schema.js';

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

/** The version a client loaded, sent back with every update (optimistic locking → 409 when stale). */
export const versionSchema = z.number({ error: 'version is required' }).int().min(1);

/** Create: the design JSON itself. Update: the design with the version the client loaded. */
export const designCreateInput = designSchema;
export const designUpdateInput = z.object({
  version: versionSchema,
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
  /** Cut plans and their exports: every member, viewers included (PRODUCT.md §2 "plans and exports it is shown"). */
  readPlans: ['owner', 'designer', 'maker', 'viewer'],
  tickParts: ['owner', 'maker'],
  manageStock: ['owner', 'maker'],
  /** Designers choose stock for cut plans; viewers see plans, not the stock room. */
  readStock: ['owner', 'designer', 'maker'],
  /** Build photos and drivers' parameter files (a stock CSV also needs manageStock). */
  uploadFiles: ['owner', 'designer', 'maker'],
  manageMembers: ['owner'],
  manageWorkshop: ['owner'],
} as const satisfies Record<string, readonly Role[]>;
export type Permission = keyof typeof PERMISSIONS;

export function can(role: Role | undefined | null, permission: Permission): boolean {
  return role != null && (PERMISSIONS[permission] as readonly Role[]).includes(role);
}

// ─── Stock room (PRODUCT.md §4, §6) ─────────────────────────────────────────────────────────────
export const STOCK_KINDS = ['sheet', 'remnant', 'roll'] as const;
export type StockKind = (typeof STOCK_KINDS)[number];
/** 'length': the grain runs along the sheet's height (its long side as listed); 'none': parts may turn. */
export const GRAIN_KINDS = ['none', 'length'] as const;
export type GrainKind = (typeof GRAIN_KINDS)[number];

const mm = (what: string, max: number) =>
  z
    .number({ error: `${what} must be a number (mm)` })
    .refine((v) => Number.isFinite(v) && v > 0, `${what} must be greater than 0`)
    .refine((v) => v <= max, `${what} must be at most ${max} mm`);

/** A stock item as typed in a form or a CSV row. Sheets and remnants need a height; rolls a width and optional length. */
export const stockInput = z
  .object({
    kind: z.enum(STOCK_KINDS, { error: 'kind must be sheet, remnant or roll' }),
    material: z.string({ error: 'material is required' }).trim().min(1, 'material is required').max(80, 'material must be at most 80 characters'),
    thicknessMm: mm('thickness', 200),
    widthMm: mm('width', 10_000),
    heightMm: mm('height', 10_000).nullable().default(null),
    /** Roll only: the length on the roll; null = as much as needed. */
    lengthMm: mm('length', 1_000_000).nullable().default(null),
    /** null = unlimited. */
    quantity: z.number({ error: 'quantity must be a whole number' }).int('quantity must be a whole number').min(0, 'quantity must be 0 or more').max(100_000).nullable().default(null),
    /** Per sheet or remnant; per metre for a roll. */
    cost: z.number({ error: 'cost must be a number' }).min(0, 'cost must be 0 or more').max(1_000_000).nullable().default(null),
    grain: z.enum(GRAIN_KINDS, { error: 'grain must be none or length' }).default('none'),
    note: z.string().trim().max(200, 'note must be at most 200 characters').default(''),
  })
  .superRefine((s, ctx) => {
    if (s.kind !== 'roll' && s.heightMm === null) ctx.addIssue({ code: 'custom', path: ['heightMm'], message: `a ${s.kind} needs a height` });
    if (s.kind === 'roll' && s.heightMm !== null) ctx.addIssue({ code: 'custom', path: ['heightMm'], message: 'a roll has a length, not a height' });
    if (s.kind !== 'roll' && s.lengthMm !== null) ctx.addIssue({ code: 'custom', path: ['lengthMm'], message: `a ${s.kind} has a height, not a length` });
  });
export type StockInput = z.input<typeof stockInput>;
export type StockValues = z.output<typeof stockInput>;

export const stockUpdateInput = z.object({
  version: versionSchema,
  item: stockInput,
});

/** What a piece of stock is: shared by the stock room and the cut plan's snapshot of it. */
export interface StockFieldsDto {
  kind: StockKind;
  material: string;
  thicknessMm: number;
  widthMm: number;
  /** Sheet or remnant. */
  heightMm: number | null;
  /** Roll: available length; null = as much as needed. */
  lengthMm: number | null;
  /** null = unlimited. */
  quantity: number | null;
  /** Per sheet or remnant; per metre for a roll. */
  cost: number | null;
  grain: GrainKind;
}

export interface StockItemDto extends StockFieldsDto {
  id: number;
  note: string;
  /** For a remnant: the cut plan it was kept from. */
  fromPlanId: number | null;
  version: number;
  createdAt: string;
  updatedAt: string;
  updatedBy: string | null;
}

/** One bad cell of an imported CSV: `row` is the line as a spreadsheet numbers it (the header is row 1). */
export interface CsvRowProblem {
  row: number;
  column: string;
  reason: string;
}
export interface StockImportReport {
  imported: number;
  problems: CsvRowProblem[];
}

// ─── Audit ──────────────────────────────────────────────────────────────────────────────────────
export interface AuditEventDto {
  id: number;
  subjectType: string;
  subjectId: number;
  action: string;
  summary: string;
  actorEmail: string;
  at: string;
}

// ─── Builds, nest jobs, cut plans and exports (PRODUCT.md §4–§6) ────────────────────────────────
export const buildItemInput = z
  .object({
    designId: z.number({ error: 'choose a design' }).int('choose a design').positive('choose a design'),
    /** Cabinets built from this design; a pair is 2. */
    quantity: z
      .number({ error: 'quantity must be a whole number' })
      .int('quantity must be a whole number')
      .min(1, 'quantity must be at least 1')
      .max(200, 'quantity must be at most 200'),
    /** Half of the cabinets are built as the mirror image of the design (left and right of a pair). */
    mirroredPair: z.boolean({ error: 'mirrored pair must be true or false' }).default(false),
  })
  .superRefine((item, ctx) => {
    if (item.mirroredPair && item.quantity % 2 !== 0) {
      ctx.addIssue({ code: 'custom', path: ['quantity'], message: 'a mirrored pair needs an even quantity (a pair is 2)' });
    }
  });

export const buildInput = z
  .object({
    name: z.string({ error: 'name is required' }).trim().min(1, 'name is required').max(120, 'name is at most 120 characters'),
    notes: z.string().trim().max(1000, 'notes are at most 1000 characters').default(''),
    items: z.array(buildItemInput, { error: 'items must be a list' }).min(1, 'add at least one design').max(50, 'at most 50 designs in one build'),
  })
  .superRefine((b, ctx) => {
    const seen = new Set<number>();
    b.items.forEach((item, i) => {
      if (seen.has(item.designId)) ctx.addIssue({ code: 'custom', path: ['items', i, 'designId'], message: 'this design is already in the build' });
      seen.add(item.designId);
    });
  });
export type BuildInput = z.input<typeof buildInput>;
export type BuildValues = z.output<typeof buildInput>;

export const buildUpdateInput = z.object({
  version: versionSchema,
  build: buildInput,
});

export interface BuildItemDto {
  designId: number;
  /** null when the design was deleted since. */
  designName: string | null;
  quantity: number;
  mirroredPair: boolean;
}
export interface BuildDto {
  id: number;
  name: string;
  notes: string;
  items: BuildItemDto[];
  /** Cabinets in the build (sum of the quantities). */
  cabinetCount: number;
  cutPlanCount: number;
  latestCutPlanId: number | null;
  version: number;
  createdAt: string;
  updatedAt: string;
  updatedBy: string | null;
}

export const CUT_MODES = ['guillotine', 'free'] as const;
export type CutMode = (typeof CUT_MODES)[number];

/** Kerf default 3.2 mm: a common panel-saw / table-saw blade (common practice). */
export const DEFAULT_KERF_MM = 3.2;

/** Settings of a cut plan; the stock comes from the stock room (`stockIds`, or all of it) or is typed in. */
export const cutPlanSettingsInput = z.object({
  kerfMm: z.number({ error: 'kerf must be a number (mm)' }).min(0, 'kerf must be 0 or more').max(20, 'kerf must be at most 20 mm').default(DEFAULT_KERF_MM),
  /** Edge trim on every side of sheets and remnants (rolls are not trimmed). */
  trimMm: z.number({ error: 'trim must be a number (mm)' }).min(0, 'trim must be 0 or more').max(100, 'trim must be at most 100 mm').default(10),
  mode: z.enum(CUT_MODES, { error: 'mode must be guillotine or free' }).default('guillotine'),
  /** Offcuts at least this size on both sides are listed to keep. */
  minOffcutMm: z.number({ error: 'minimum offcut must be a number (mm)' }).min(0, 'minimum offcut must be 0 or more').max(5000, 'minimum offcut must be at most 5000 mm').default(200),
  objective: z.enum(['sheets', 'cost'], { error: 'objective must be sheets or cost' }).default('sheets'),
  /** Search time for the whole plan, shared between its materials. */
  timeLimitMs: z.number({ error: 'time limit must be a number (ms)' }).int().min(200, 'time limit must be at least 200 ms').max(60_000, 'time limit must be at most 60 s').default(3000),
  seed: z.number({ error: 'seed must be a whole number' }).int('seed must be a whole number').default(1),
  /** Stock room items to use; omitted: every item in the room. */
  stockIds: z.array(z.number().int().positive()).max(500).optional(),
  /** Stock typed in for this plan only (used instead of the stock room). */
  typedStock: z.array(stockInput).min(1, 'type in at least one stock size').max(20, 'at most 20 typed stock sizes').optional(),
});
export type CutPlanSettingsInput = z.input<typeof cutPlanSettingsInput>;
export type CutPlanSettings = z.output<typeof cutPlanSettingsInput>;

/** `POST /nest-jobs`: a build to plan (→ a saved cut plan), or a raw nest job (PRODUCT.md §8; result only). */
export const nestJobCreateInput = z
  .object({
    buildId: z.number({ error: 'buildId must be a build id' }).int().positive().optional(),
    settings: cutPlanSettingsInput.prefault({}),
    job: z.unknown().optional(),
  })
  .superRefine((b, ctx) => {
    if ((b.buildId === undefined) === (b.job === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['buildId'], message: 'give either a buildId or a nest job' });
    }
  });
export type NestJobCreateInput = z.input<typeof nestJobCreateInput>;

export const NEST_JOB_STATUSES = ['queued', 'running', 'done', 'failed', 'cancelled'] as const;
export type NestJobStatus = (typeof NEST_JOB_STATUSES)[number];

export interface NestJobDto {
  id: string;
  status: NestJobStatus;
  /** 0..1 */
  progress: number;
  /** Sheets in the best layout found so far. */
  bestSheets: number;
  message: string;
  buildId: number | null;
  createdAt: string;
  finishedAt: string | null;
  error: { code: string; message: string } | null;
  /** When done: the saved cut plan (build jobs) and the layouts (one per material group). */
  result: { cutPlanId: number | null; layouts: Layout[] } | null;
}

/** A stock item as the cut plan used it (a snapshot: the stock room may change later). */
export interface CutPlanStockDto extends StockFieldsDto {
  /** The nest job's stock id (what layout sheets name): `#12` for stock room item 12, `typed 1` for typed-in stock. */
  id: string;
  /** The stock room item, or null for typed-in stock. */
  stockItemId: number | null;
  trimMm: number;
}

/** One part of the cut plan: a panel or lining piece of one cabinet design, for the whole build. */
export interface CutPlanPartDto {
  /** The id placements use: `harbour-bookshelf/left-side`. */
  id: string;
  kind: 'panel' | 'lining';
  name: string;
  cabinet: string;
  widthMm: number;
  heightMm: number;
  thicknessMm: number;
  quantity: number;
  grain: 'height' | 'width' | 'none';
  material: string;
}

/** Parts of one material and thickness nested on their own stock. */
export interface CutPlanGroupDto {
  key: string;
  kind: 'panels' | 'lining';
  /** "MDF 18 mm", "Lining 50 mm". */
  label: string;
  material: string;
  thicknessMm: number;
  /** Stock ids (CutPlanStockDto.id) offered to this group. */
  stockIds: string[];
  layout: Layout;
}

export interface CutPlanTotalsDto {
  sheetsUsed: number;
  remnantsUsed: number;
  rollLengthMm: number;
  /** null when no stock used has a price. */
  cost: number | null;
  costIncomplete: boolean;
  liningMassKg: number | null;
  partsPlaced: number;
  partsUnplaced: number;
  utilisation: number;
  /** Stock area used that is neither parts nor kept offcuts (m²). */
  wasteM2: number;
  /** No layout can use fewer new sheets (absent: not known, or plans made before it was recorded). */
  sheetsLowerBound?: number;
}

export interface CutPlanCabinetDto {
  name: string;
  designId: number;
  count: number;
  mirrored: boolean;
}

export interface CutPlanSummaryDto {
  id: number;
  buildId: number | null;
  buildName: string;
  mode: CutMode;
  totals: CutPlanTotalsDto;
  warningCount: number;
  createdAt: string;
  createdBy: string | null;
}

export interface CutPlanDto extends CutPlanSummaryDto {
  settings: CutPlanSettings;
  stock: CutPlanStockDto[];
  parts: CutPlanPartDto[];
  cabinets: CutPlanCabinetDto[];
  groups: CutPlanGroupDto[];
  warnings: { code: string; message: string; field?: string }[];
}

export const EXPORT_PAPERS = ['A4', 'Letter', 'A3', 'Tabloid', 'roll'] as const;

// ─── Workshop settings (PRODUCT.md §2: the owner's "workshop settings, deleting the workshop") ──────
export const workshopNameSchema = z
  .string({ error: 'name is required' })
  .trim()
  .min(1, 'name is required')
  .max(120, 'name must be at most 120 characters');

/** ISO 4217 codes a workshop may price its stock in; null = plain numbers. */
export const CURRENCIES = ['EUR', 'GBP', 'USD', 'CAD', 'AUD', 'NZD', 'CHF', 'SEK', 'NOK', 'DKK', 'PLN', 'JPY'] as const;
export type Currency = (typeof CURRENCIES)[number];
export const currencySchema = z.enum(CURRENCIES, { error: `currency must be one of ${CURRENCIES.join(', ')}, or none` }).nullable();

/** The settings that prefill "Make cut plan": the cut plan settings' own rules (one schema, not a copy). */
export const cutDefaultsInput = cutPlanSettingsInput.pick({ kerfMm: true, trimMm: true, minOffcutMm: true, mode: true, timeLimitMs: true });
export type CutDefaultsInput = z.input<typeof cutDefaultsInput>;
export type CutDefaults = z.output<typeof cutDefaultsInput>;
/** The cut settings a workshop starts from when it has saved none: the cut plan schema's own defaults. */
export const USUAL_CUT_DEFAULTS: CutDefaults = cutDefaultsInput.parse({});

export const workshopCreateInput = z.object({ name: workshopNameSchema });
/** `PATCH /workshops/:wid`: only the fields sent change; `cutDefaults` replaces the defaults whole (missing ones take the usual value). */
export const workshopUpdateInput = z.object({
  version: versionSchema,
  name: workshopNameSchema.optional(),
  currency: currencySchema.optional(),
  cutDefaults: cutDefaultsInput.optional(),
});
export type WorkshopUpdateInput = z.input<typeof workshopUpdateInput>;
export type WorkshopUpdateValues = z.output<typeof workshopUpdateInput>;
/** `DELETE /workshops/:wid`: the owner types the workshop's name to confirm. */
export const workshopDeleteInput = z.object({
  confirmName: z.string({ error: "type the workshop's name to confirm" }).min(1, "type the workshop's name to confirm").max(200),
});

export interface WorkshopDto {
  id: number;
  name: string;
  currency: Currency | null;
  cutDefaults: CutDefaults;
  version: number;
}

// ─── E-mail, invitations, password reset ────────────────────────────────────────────────────────
export interface MailMessageDto {
  id: number;
  kind: string;
  to: string;
  subject: string;
  text: string;
  via: 'catcher' | 'smtp' | 'none';
  status: 'sending' | 'sent' | 'failed';
  error: string | null;
  sentAt: string;
  caughtAt: string | null;
}

export const invitationInput = z.object({ email: emailSchema, role: roleSchema });
export type InvitationInput = z.input<typeof invitationInput>;
export interface InvitationDto {
  id: number;
  email: string;
  role: Role;
  status: 'pending' | 'accepted' | 'expired' | 'revoked';
  expiresAt: string;
  invitedBy: string;
  createdAt: string;
  /** Whether the e-mail left (false: the invitation is saved, the mail failed; see Sent mail). */
  mailSent?: boolean;
}
/** What the invitation link's page shows before accepting. */
export interface InvitationPreviewDto {
  workshopName: string;
  email: string;
  role: Role;
  /** An account with this e-mail exists: sign in as it and accept; else set a password. */
  accountExists: boolean;
  expiresAt: string;
}
/** New account: a password. Existing account: an empty body, signed in as the invited e-mail. */
export const invitationAcceptInput = z.object({ password: passwordSchema.optional() });

export const passwordResetRequestInput = z.object({ email: emailSchema });
export const passwordResetInput = z.object({ password: passwordSchema });

// ─── Uploads ────────────────────────────────────────────────────────────────────────────────────
export const UPLOAD_KINDS = ['photo', 'drivers-csv', 'stock-csv'] as const;
export type UploadKind = (typeof UPLOAD_KINDS)[number];
export interface UploadDto {
  id: number;
  kind: UploadKind;
  subjectType: string | null;
  subjectId: number | null;
  name: string;
  contentType: string;
  sizeBytes: number;
  uploadedBy: string;
  createdAt: string;
  /** Download/view URL under /api. */
  url: string;
}
/** One row of a drivers' parameters CSV (our own columns). */
export interface DriverParamsDto {
  name: string;
  cutoutDiameterMm: number;
  displacementLitres: number;
  /** Sd, cm². */
  coneAreaCm2: number;
  /** Xmax, one way, mm. */
  excursionMm: number;
}

// ─── Build checklist (cut parts and sheets) ─────────────────────────────────────────────────────
export interface ChecklistMarkDto {
  by: string;
  at: string;
}
/** One piece to cut: part `partId`, piece `n` of `of`. */
export interface ChecklistPartDto {
  key: string;
  partId: string;
  n: number;
  of: number;
  kind: 'panel' | 'lining';
  name: string;
  cabinet: string;
  widthMm: number;
  heightMm: number;
  thicknessMm: number;
  material: string;
  cut: ChecklistMarkDto | null;
}
/** One sheet, remnant or roll length of the plan; marking it cut takes it from stock and keeps its offcuts. */
export interface ChecklistSheetDto {
  key: string;
  groupLabel: string;
  /** 1-based within its group. */
  index: number;
  /** Its name as on the cut plan page and the cut diagrams: "Sheet 2", "Remnant 1", "Roll 1". */
  label: string;
  stockKind: StockKind;
  widthMm: number;
  /** On a roll: the length used. */
  heightMm: number;
  partCount: number;
  /** Offcuts that become remnants when the sheet is marked cut. */
  offcuts: { widthMm: number; heightMm: number }[];
  /** Whether it comes from the stock room (else typed in: nothing to deduct). */
  fromStockRoom: boolean;
  cut: ChecklistMarkDto | null;
}
export interface ChecklistProgressDto {
  label: string;
  done: number;
  total: number;
}
export interface ChecklistDto {
  planId: number;
  /** The build it was made from (photos and files are attached to the build); null if the build was deleted. */
  buildId: number | null;
  buildName: string;
  parts: ChecklistPartDto[];
  sheets: ChecklistSheetDto[];
  /** Pieces cut per cabinet design, and in total. */
  cabinets: ChecklistProgressDto[];
  total: ChecklistProgressDto;
  sheetsProgress: ChecklistProgressDto;
}
export const checklistTickInput = z.object({
  item: z.enum(['part', 'sheet'], { error: 'item must be part or sheet' }),
  key: z.string({ error: 'key is required' }).min(1, 'key is required').max(300),
  cut: z.boolean({ error: 'cut must be true or false' }),
});
export type ChecklistTickInput = z.input<typeof checklistTickInput>;

// ─── Share links ────────────────────────────────────────────────────────────────────────────────
export const shareLinkInput = z.object({
  /** How long the link works: 1 to 90 days (default 14). */
  days: z.number({ error: 'days must be a whole number' }).int('days must be a whole number').min(1, 'at least 1 day').max(90, 'at most 90 days').default(14),
  /** Send the link to this address ("send this cut plan"). */
  email: emailSchema.optional(),
  message: z.string().trim().max(500, 'the note must be at most 500 characters').optional(),
});
export type ShareLinkInput = z.input<typeof shareLinkInput>;
export interface ShareLinkDto {
  id: number;
  planId: number;
  status: 'active' | 'expired' | 'revoked';
  expiresAt: string;
  sentTo: string | null;
  createdBy: string;
  createdAt: string;
  lastOpenedAt: string | null;
  openCount: number;
  /** Only in the answer that created it: the link itself (never stored). */
  url?: string;
  mailSent?: boolean;
}
/** What a share link shows: one cut plan, read-only, without the workshop's people or stock-room ids. */
export interface SharedPlanDto {
  buildName: string;
  createdAt: string;
  expiresAt: string;
  mode: CutMode;
  settings: Pick<CutPlanSettings, 'kerfMm' | 'trimMm' | 'mode' | 'minOffcutMm'>;
  totals: CutPlanTotalsDto;
  cabinets: CutPlanCabinetDto[];
  parts: CutPlanPartDto[];
  groups: CutPlanGroupDto[];
  warnings: { code: string; message: string }[];
  /** Export file names under /api/share/:token/exports/. */
  exports: string[];
  /** The workshop's currency (ISO 4217 code, shown after amounts as members see them), or null when none is set. */
  currency: Currency | null;
}
