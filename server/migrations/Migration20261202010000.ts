import { Migration } from '@mikro-orm/migrations';

/**
 * Workshop settings: the currency prices are shown in (ISO 4217 code, null = plain numbers), the default cut
 * settings that prefill "Make cut plan" (null = the usual defaults), and a version for optimistic locking.
 * Existing workshops get null, null and version 1. Columns are appended in the entity's order.
 */
export class Migration20261202010000 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`alter table \`workshops\` add column \`currency\` text null;`);
    this.addSql(`alter table \`workshops\` add column \`cut_defaults\` json null;`);
    this.addSql(`alter table \`workshops\` add column \`version\` integer not null default 1;`);
  }

}
