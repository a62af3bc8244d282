import { Migration } from '@mikro-orm/migrations';

export class Migration20261201222028 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table \`password_reset_tokens\` (\`id\` integer not null primary key autoincrement, \`user_id\` integer not null, \`token_hash\` text not null, \`expires_at\` datetime not null, \`used_at\` datetime null, \`created_at\` datetime not null, constraint \`password_reset_tokens_user_id_foreign\` foreign key(\`user_id\`) references \`users\`(\`id\`) on delete cascade on update cascade);`);
    this.addSql(`create index \`password_reset_tokens_user_id_index\` on \`password_reset_tokens\` (\`user_id\`);`);
    this.addSql(`create unique index \`password_reset_tokens_token_hash_unique\` on \`password_reset_tokens\` (\`token_hash\`);`);

    this.addSql(`create table \`uploads\` (\`id\` integer not null primary key autoincrement, \`workshop_id\` integer not null, \`kind\` text check (\`kind\` in ('photo', 'drivers-csv', 'stock-csv')) not null, \`subject_type\` text null, \`subject_id\` integer null, \`original_name\` text not null, \`storage_key\` text not null, \`content_type\` text not null, \`size_bytes\` integer not null, \`sha256\` text not null, \`parsed\` json null, \`uploaded_by\` text not null, \`created_at\` datetime not null, constraint \`uploads_workshop_id_foreign\` foreign key(\`workshop_id\`) references \`workshops\`(\`id\`) on delete cascade on update cascade);`);
    this.addSql(`create index \`uploads_workshop_id_index\` on \`uploads\` (\`workshop_id\`);`);
    this.addSql(`create unique index \`uploads_storage_key_unique\` on \`uploads\` (\`storage_key\`);`);
    this.addSql(`create index \`uploads_workshop_id_subject_type_subject_id_index\` on \`uploads\` (\`workshop_id\`, \`subject_type\`, \`subject_id\`);`);

    this.addSql(`create table \`mail_messages\` (\`id\` integer not null primary key autoincrement, \`workshop_id\` integer null, \`kind\` text not null, \`to_address\` text not null, \`subject\` text not null, \`text_body\` text not null, \`message_id\` text null, \`via\` text not null, \`status\` text not null, \`error\` text null, \`sent_at\` datetime not null, \`caught_at\` datetime null, constraint \`mail_messages_workshop_id_foreign\` foreign key(\`workshop_id\`) references \`workshops\`(\`id\`) on delete cascade on update cascade);`);
    this.addSql(`create index \`mail_messages_workshop_id_index\` on \`mail_messages\` (\`workshop_id\`);`);
    this.addSql(`create index \`mail_messages_message_id_index\` on \`mail_messages\` (\`message_id\`);`);

    this.addSql(`create table \`invitations\` (\`id\` integer not null primary key autoincrement, \`workshop_id\` integer not null, \`email\` text not null, \`role\` text check (\`role\` in ('owner', 'designer', 'maker', 'viewer')) not null, \`token_hash\` text not null, \`expires_at\` datetime not null, \`accepted_at\` datetime null, \`accepted_by_user_id\` integer null, \`revoked_at\` datetime null, \`invited_by\` text not null, \`created_at\` datetime not null, constraint \`invitations_workshop_id_foreign\` foreign key(\`workshop_id\`) references \`workshops\`(\`id\`) on delete cascade on update cascade);`);
    this.addSql(`create index \`invitations_workshop_id_index\` on \`invitations\` (\`workshop_id\`);`);
    this.addSql(`create unique index \`invitations_token_hash_unique\` on \`invitations\` (\`token_hash\`);`);
  }

}
