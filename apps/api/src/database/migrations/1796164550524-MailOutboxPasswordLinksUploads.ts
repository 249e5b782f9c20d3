import { MigrationInterface, QueryRunner } from 'typeorm';

export class MailOutboxPasswordLinksUploads1796164550524 implements MigrationInterface {
  name = 'MailOutboxPasswordLinksUploads1796164550524';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            CREATE TABLE \`uploads\` (
                \`id\` int NOT NULL AUTO_INCREMENT,
                \`kind\` varchar(20) NOT NULL,
                \`cycle_id\` int NULL,
                \`aircraft_type_id\` int NULL,
                \`uploaded_by_id\` int NOT NULL,
                \`uploaded_at\` datetime(3) NOT NULL,
                \`file_name\` varchar(255) NOT NULL,
                \`mime_type\` varchar(100) NOT NULL,
                \`size_bytes\` int NOT NULL,
                \`sha256\` char(64) NOT NULL,
                \`result\` varchar(10) NOT NULL,
                \`problem_count\` int NOT NULL,
                \`problems\` json NOT NULL,
                \`parsed_rows\` json NULL,
                \`imported_at\` datetime(3) NULL,
                \`imported_by_id\` int NULL,
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`mail_outbox\` (
                \`id\` int NOT NULL AUTO_INCREMENT,
                \`kind\` varchar(20) NOT NULL,
                \`to_address\` varchar(254) NOT NULL,
                \`subject\` varchar(200) NOT NULL,
                \`body_text\` mediumtext NOT NULL,
                \`body_html\` mediumtext NULL,
                \`dedupe_key\` varchar(120) NOT NULL,
                \`attempts\` int NOT NULL DEFAULT '0',
                \`next_attempt_at\` datetime(3) NOT NULL,
                \`sent_at\` datetime(3) NULL,
                \`last_error\` varchar(500) NULL,
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                INDEX \`ix_mail_outbox_due\` (\`sent_at\`, \`next_attempt_at\`),
                UNIQUE INDEX \`uq_mail_outbox_dedupe_key\` (\`dedupe_key\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`password_links\` (
                \`id\` int NOT NULL AUTO_INCREMENT,
                \`user_id\` int NOT NULL,
                \`purpose\` varchar(12) NOT NULL,
                \`token_hash\` char(64) NOT NULL,
                \`expires_at\` datetime(3) NOT NULL,
                \`used_at\` datetime(3) NULL,
                \`created_at\` datetime(3) NOT NULL,
                UNIQUE INDEX \`uq_password_links_token_hash\` (\`token_hash\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            ALTER TABLE \`uploads\`
            ADD CONSTRAINT \`FK_9c939f8cf2a5b19c80393027e75\` FOREIGN KEY (\`cycle_id\`) REFERENCES \`cycles\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`uploads\`
            ADD CONSTRAINT \`FK_ac02dc59ddf4c6925d1955d2934\` FOREIGN KEY (\`aircraft_type_id\`) REFERENCES \`aircraft_types\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`uploads\`
            ADD CONSTRAINT \`FK_e4eac210e1666317baf35a7dd40\` FOREIGN KEY (\`uploaded_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`uploads\`
            ADD CONSTRAINT \`FK_ade019accbaee94ea9cfbc70ab8\` FOREIGN KEY (\`imported_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE
            SET NULL ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`password_links\`
            ADD CONSTRAINT \`FK_5df8ca33044c0215813e3bb68be\` FOREIGN KEY (\`user_id\`) REFERENCES \`users\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`password_links\` DROP FOREIGN KEY \`FK_5df8ca33044c0215813e3bb68be\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`uploads\` DROP FOREIGN KEY \`FK_ade019accbaee94ea9cfbc70ab8\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`uploads\` DROP FOREIGN KEY \`FK_e4eac210e1666317baf35a7dd40\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`uploads\` DROP FOREIGN KEY \`FK_ac02dc59ddf4c6925d1955d2934\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`uploads\` DROP FOREIGN KEY \`FK_9c939f8cf2a5b19c80393027e75\`
        `);
    await queryRunner.query(`
            DROP INDEX \`uq_password_links_token_hash\` ON \`password_links\`
        `);
    await queryRunner.query(`
            DROP TABLE \`password_links\`
        `);
    await queryRunner.query(`
            DROP INDEX \`uq_mail_outbox_dedupe_key\` ON \`mail_outbox\`
        `);
    await queryRunner.query(`
            DROP INDEX \`ix_mail_outbox_due\` ON \`mail_outbox\`
        `);
    await queryRunner.query(`
            DROP TABLE \`mail_outbox\`
        `);
    await queryRunner.query(`
            DROP TABLE \`uploads\`
        `);
  }
}
