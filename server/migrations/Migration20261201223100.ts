import { Migration } from '@mikro-orm/migrations';

export class Migration20261201223100 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table \`share_links\` (\`id\` integer not null primary key autoincrement, \`workshop_id\` integer not null, \`cut_plan_id\` integer not null, \`token_hash\` text not null, \`expires_at\` datetime not null, \`revoked_at\` datetime null, \`sent_to\` text null, \`created_by\` text not null, \`created_at\` datetime not null, \`last_opened_at\` datetime null, \`open_count\` integer not null default 0, constraint \`share_links_workshop_id_foreign\` foreign key(\`workshop_id\`) references \`workshops\`(\`id\`) on delete cascade on update cascade, constraint \`share_links_cut_plan_id_foreign\` foreign key(\`cut_plan_id\`) references \`cut_plans\`(\`id\`) on delete cascade on update cascade);`);
    this.addSql(`create index \`share_links_workshop_id_index\` on \`share_links\` (\`workshop_id\`);`);
    this.addSql(`create index \`share_links_cut_plan_id_index\` on \`share_links\` (\`cut_plan_id\`);`);
    this.addSql(`create unique index \`share_links_token_hash_unique\` on \`share_links\` (\`token_hash\`);`);

    this.addSql(`create table \`checklist_ticks\` (\`id\` integer not null primary key autoincrement, \`workshop_id\` integer not null, \`cut_plan_id\` integer not null, \`item_key\` text not null, \`by_email\` text not null, \`at\` datetime not null, \`stock_item_id\` integer null, \`deducted\` real null, \`remnant_ids\` json null, constraint \`checklist_ticks_workshop_id_foreign\` foreign key(\`workshop_id\`) references \`workshops\`(\`id\`) on delete cascade on update cascade, constraint \`checklist_ticks_cut_plan_id_foreign\` foreign key(\`cut_plan_id\`) references \`cut_plans\`(\`id\`) on delete cascade on update cascade);`);
    this.addSql(`create index \`checklist_ticks_workshop_id_index\` on \`checklist_ticks\` (\`workshop_id\`);`);
    this.addSql(`create index \`checklist_ticks_cut_plan_id_index\` on \`checklist_ticks\` (\`cut_plan_id\`);`);
    this.addSql(`create unique index \`checklist_ticks_cut_plan_id_item_key_unique\` on \`checklist_ticks\` (\`cut_plan_id\`, \`item_key\`);`);
  }

}
