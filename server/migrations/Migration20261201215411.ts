import { Migration } from '@mikro-orm/migrations';

export class Migration20261201215411 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table \`users\` (\`id\` integer not null primary key autoincrement, \`email\` text not null, \`password_hash\` text not null, \`units\` text check (\`units\` in ('mm', 'in')) not null default 'mm', \`created_at\` datetime not null);`);
    this.addSql(`create unique index \`users_email_unique\` on \`users\` (\`email\`);`);

    this.addSql(`create table \`workshops\` (\`id\` integer not null primary key autoincrement, \`name\` text not null, \`created_at\` datetime not null);`);

    this.addSql(`create table \`memberships\` (\`id\` integer not null primary key autoincrement, \`user_id\` integer not null, \`workshop_id\` integer not null, \`role\` text check (\`role\` in ('owner', 'designer', 'maker', 'viewer')) not null, \`created_at\` datetime not null, constraint \`memberships_user_id_foreign\` foreign key(\`user_id\`) references \`users\`(\`id\`) on delete cascade on update cascade, constraint \`memberships_workshop_id_foreign\` foreign key(\`workshop_id\`) references \`workshops\`(\`id\`) on delete cascade on update cascade);`);
    this.addSql(`create index \`memberships_user_id_index\` on \`memberships\` (\`user_id\`);`);
    this.addSql(`create index \`memberships_workshop_id_index\` on \`memberships\` (\`workshop_id\`);`);
    this.addSql(`create unique index \`memberships_user_id_workshop_id_unique\` on \`memberships\` (\`user_id\`, \`workshop_id\`);`);

    this.addSql(`create table \`designs\` (\`id\` integer not null primary key autoincrement, \`workshop_id\` integer not null, \`name\` text not null, \`data\` json not null, \`version\` integer not null default 1, \`created_at\` datetime not null, \`updated_at\` datetime not null, \`updated_by\` text null, constraint \`designs_workshop_id_foreign\` foreign key(\`workshop_id\`) references \`workshops\`(\`id\`) on delete cascade on update cascade);`);
    this.addSql(`create index \`designs_workshop_id_index\` on \`designs\` (\`workshop_id\`);`);
  }

}
