import { Migration } from '@mikro-orm/migrations';

export class Migration20261201221145 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table \`stock_items\` (\`id\` integer not null primary key autoincrement, \`workshop_id\` integer not null, \`kind\` text check (\`kind\` in ('sheet', 'remnant', 'roll')) not null, \`material\` text not null, \`thickness_mm\` real not null, \`width_mm\` real not null, \`height_mm\` real null, \`length_mm\` real null, \`quantity\` integer null, \`cost\` real null, \`grain\` text check (\`grain\` in ('none', 'length')) not null default 'none', \`note\` text not null default '', \`from_plan_id\` integer null, \`version\` integer not null default 1, \`created_at\` datetime not null, \`updated_at\` datetime not null, \`updated_by\` text null, constraint \`stock_items_workshop_id_foreign\` foreign key(\`workshop_id\`) references \`workshops\`(\`id\`) on delete cascade on update cascade);`);
    this.addSql(`create index \`stock_items_workshop_id_index\` on \`stock_items\` (\`workshop_id\`);`);

    this.addSql(`create table \`audit_events\` (\`id\` integer not null primary key autoincrement, \`workshop_id\` integer not null, \`subject_type\` text not null, \`subject_id\` integer not null, \`action\` text not null, \`summary\` text not null, \`actor_email\` text not null, \`at\` datetime not null, constraint \`audit_events_workshop_id_foreign\` foreign key(\`workshop_id\`) references \`workshops\`(\`id\`) on delete cascade on update cascade);`);
    this.addSql(`create index \`audit_events_workshop_id_index\` on \`audit_events\` (\`workshop_id\`);`);
    this.addSql(`create index \`audit_events_workshop_id_subject_type_subject_id_index\` on \`audit_events\` (\`workshop_id\`, \`subject_type\`, \`subject_id\`);`);
  }

}
