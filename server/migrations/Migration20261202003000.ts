import { Migration } from '@mikro-orm/migrations';

/**
 * users.session_version: bumped when the password is set, so every session signed in before it stops working
 * (the session keeps the version it was signed in with; server/modules/auth/auth.passport.ts). Existing rows get 0,
 * which is what sessions made before this migration are read as.
 */
export class Migration20261202003000 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`alter table \`users\` add column \`session_version\` integer not null default 0;`);
  }

}
