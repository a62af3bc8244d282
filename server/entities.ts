import { User } from './modules/auth/user.entity.js';
import { Design } from './modules/designs/design.entity.js';
import { Membership } from './modules/workshops/membership.entity.js';
import { Workshop } from './modules/workshops/workshop.entity.js';
import { AuditEvent } from './modules/audit/audit.entity.js';
import { StockItem } from './modules/stock/stock-item.entity.js';
import { MailMessage } from './modules/mail/mail-message.entity.js';
import { Invitation } from './modules/invitations/invitation.entity.js';
import { PasswordResetToken } from './modules/password-reset/password-reset-token.entity.js';
import { Upload } from './modules/uploads/upload.entity.js';
import { ChecklistTick } from './modules/checklist/checklist-tick.entity.js';
import { ShareLink } from './modules/share-links/share-link.entity.js';
import { Build } from './modules/builds/build.entity.js';
import { CutPlan } from './modules/cut-plans/cut-plan.entity.js';

/** Every entity, listed once for the ORM config (explicit, so tsx, vitest and the CLI see the same set). */
export const ENTITIES = [User, Workshop, Membership, Design, StockItem, AuditEvent, MailMessage, Invitation, PasswordResetToken, Upload, Build, CutPlan, ChecklistTick, ShareLink];
