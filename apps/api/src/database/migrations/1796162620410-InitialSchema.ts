import { MigrationInterface, QueryRunner } from 'typeorm';

export class InitialSchema1796162620410 implements MigrationInterface {
  name = 'InitialSchema1796162620410';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            CREATE TABLE \`aircraft_types\` (
                \`id\` int NOT NULL AUTO_INCREMENT,
                \`designation\` varchar(20) NOT NULL,
                \`name\` varchar(120) NOT NULL,
                \`max_gross_weight_lb\` int NOT NULL,
                \`crosswind_limit_kt\` double NOT NULL,
                \`thrust_lbf\` int NOT NULL,
                \`required_excess_kt\` double NOT NULL,
                \`afterburner_from_lb\` int NULL,
                \`trim_bands\` json NOT NULL,
                \`launch_table\` json NOT NULL,
                UNIQUE INDEX \`IDX_fc8d7e38875546d38c5338fda7\` (\`designation\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`squadrons\` (
                \`id\` int NOT NULL AUTO_INCREMENT,
                \`name\` varchar(120) NOT NULL,
                \`code\` varchar(12) NOT NULL,
                \`email\` varchar(254) NOT NULL,
                UNIQUE INDEX \`IDX_9a169f17ef614da0e9a6d0e98e\` (\`code\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`aircraft\` (
                \`id\` int NOT NULL AUTO_INCREMENT,
                \`side_number\` varchar(8) NOT NULL,
                \`type_id\` int NOT NULL,
                \`squadron_id\` int NOT NULL,
                \`parked_spot\` varchar(20) NOT NULL,
                \`serviceable\` tinyint NOT NULL DEFAULT 1,
                \`catapult_shots\` int NOT NULL DEFAULT '0',
                UNIQUE INDEX \`IDX_f1de2167c5711f751172c1e70e\` (\`side_number\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`catapults\` (
                \`id\` int NOT NULL AUTO_INCREMENT,
                \`ship_id\` int NOT NULL,
                \`number\` tinyint NOT NULL,
                \`position\` varchar(5) NOT NULL,
                \`axis_angle_deg\` double NOT NULL,
                \`stroke_m\` double NOT NULL,
                \`energy_min_mj\` double NOT NULL,
                \`energy_max_mj\` double NOT NULL,
                \`setting_count\` smallint NOT NULL,
                \`reset_interval_s\` int NOT NULL,
                \`pair\` tinyint NOT NULL,
                \`status\` varchar(4) NOT NULL DEFAULT 'up',
                \`shot_count\` int NOT NULL DEFAULT '0',
                UNIQUE INDEX \`uq_catapults_ship_number\` (\`ship_id\`, \`number\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`ships\` (
                \`id\` int NOT NULL AUTO_INCREMENT,
                \`name\` varchar(120) NOT NULL,
                \`hull_code\` varchar(20) NOT NULL,
                \`pair_gap_s\` int NOT NULL,
                \`profile\` json NOT NULL,
                \`deck_spots\` json NOT NULL,
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`cycles\` (
                \`id\` int NOT NULL AUTO_INCREMENT,
                \`ship_id\` int NOT NULL,
                \`number\` int NOT NULL,
                \`planned_launch_at\` datetime(3) NOT NULL,
                \`window_start_at\` datetime(3) NOT NULL,
                \`window_end_at\` datetime(3) NOT NULL,
                \`ship_course_deg\` double NOT NULL,
                \`ship_speed_kt\` double NOT NULL,
                \`true_wind_from_deg\` double NOT NULL,
                \`true_wind_speed_kt\` double NOT NULL,
                \`temperature_c\` double NOT NULL,
                \`pressure_hpa\` double NOT NULL DEFAULT '1013',
                \`weather_case\` varchar(3) NOT NULL,
                \`night\` tinyint NOT NULL DEFAULT 0,
                \`landing_area_in_use\` tinyint NOT NULL DEFAULT 0,
                \`state\` varchar(10) NOT NULL DEFAULT 'planning',
                \`version\` int NOT NULL DEFAULT '0',
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
                UNIQUE INDEX \`uq_cycles_ship_number\` (\`ship_id\`, \`number\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`cycle_changes\` (
                \`id\` bigint NOT NULL AUTO_INCREMENT,
                \`cycle_id\` int NOT NULL,
                \`version\` int NOT NULL,
                \`actor_id\` int NOT NULL,
                \`actor_name\` varchar(120) NOT NULL,
                \`actor_role\` varchar(20) NOT NULL,
                \`at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                \`kind\` varchar(24) NOT NULL,
                \`summary\` varchar(300) NOT NULL,
                \`payload\` json NOT NULL,
                UNIQUE INDEX \`uq_cycle_changes_version\` (\`cycle_id\`, \`version\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`users\` (
                \`id\` int NOT NULL AUTO_INCREMENT,
                \`email\` varchar(254) NOT NULL,
                \`name\` varchar(120) NOT NULL,
                \`password_hash\` varchar(255) NULL,
                \`role\` varchar(20) NOT NULL,
                \`catapult_id\` int NULL,
                \`squadron_id\` int NULL,
                \`active\` tinyint NOT NULL DEFAULT 1,
                \`token_version\` int NOT NULL DEFAULT '0',
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
                UNIQUE INDEX \`IDX_97672ac88f789774dd47f7c8be\` (\`email\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`slots\` (
                \`id\` int NOT NULL AUTO_INCREMENT,
                \`cycle_id\` int NOT NULL,
                \`aircraft_id\` int NOT NULL,
                \`pilot_id\` int NULL,
                \`mission\` varchar(60) NOT NULL,
                \`fuel_lb\` int NOT NULL,
                \`stores\` varchar(120) NOT NULL DEFAULT '',
                \`gross_weight_lb\` int NOT NULL,
                \`tanker\` tinyint NOT NULL DEFAULT 0,
                \`early_warning\` tinyint NOT NULL DEFAULT 0,
                \`spare\` tinyint NOT NULL DEFAULT 0,
                \`catapult_id\` int NULL,
                \`position\` int NULL,
                \`status\` varchar(14) NOT NULL DEFAULT 'planned',
                \`version\` int NOT NULL DEFAULT '0',
                \`pilot_weight_ack_lb\` int NULL,
                \`pilot_weight_ack_at\` datetime(3) NULL,
                \`catapult_weight_ack_at\` datetime(3) NULL,
                \`taxiing_at\` datetime(3) NULL,
                \`on_catapult_at\` datetime(3) NULL,
                \`tensioned_at\` datetime(3) NULL,
                \`suspended_at\` datetime(3) NULL,
                \`suspend_reason\` varchar(200) NULL,
                \`down_at\` datetime(3) NULL,
                \`replaced_by_slot_id\` int NULL,
                \`launched_at\` datetime(3) NULL,
                \`launch_idempotency_key\` varchar(64) NULL,
                \`override_reason\` varchar(200) NULL,
                \`status_at\` datetime(3) NULL,
                \`status_by_id\` int NULL,
                INDEX \`ix_slots_lane\` (\`cycle_id\`, \`catapult_id\`, \`position\`),
                UNIQUE INDEX \`uq_slots_launch_key\` (\`launch_idempotency_key\`),
                UNIQUE INDEX \`uq_slots_cycle_aircraft\` (\`cycle_id\`, \`aircraft_id\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`refresh_tokens\` (
                \`id\` int NOT NULL AUTO_INCREMENT,
                \`user_id\` int NOT NULL,
                \`token_hash\` char(64) NOT NULL,
                \`expires_at\` datetime(3) NOT NULL,
                \`revoked_at\` datetime(3) NULL,
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                UNIQUE INDEX \`IDX_a7838d2ba25be1342091b6695f\` (\`token_hash\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            ALTER TABLE \`aircraft\`
            ADD CONSTRAINT \`FK_48233365948450420f62c447a06\` FOREIGN KEY (\`type_id\`) REFERENCES \`aircraft_types\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`aircraft\`
            ADD CONSTRAINT \`FK_d8681cc62d89fceae071a74437d\` FOREIGN KEY (\`squadron_id\`) REFERENCES \`squadrons\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`catapults\`
            ADD CONSTRAINT \`FK_289c5dda05c99d566c058eb7ab8\` FOREIGN KEY (\`ship_id\`) REFERENCES \`ships\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`cycles\`
            ADD CONSTRAINT \`FK_77610ea418ad42e451ce0ce3736\` FOREIGN KEY (\`ship_id\`) REFERENCES \`ships\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`cycle_changes\`
            ADD CONSTRAINT \`FK_73c8b4bba7e07571306c02f35ad\` FOREIGN KEY (\`cycle_id\`) REFERENCES \`cycles\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`users\`
            ADD CONSTRAINT \`FK_e9c53c4cfdf41d198fd27ef198e\` FOREIGN KEY (\`catapult_id\`) REFERENCES \`catapults\`(\`id\`) ON DELETE
            SET NULL ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`users\`
            ADD CONSTRAINT \`FK_bf7bdd3cdaae529a352d641571e\` FOREIGN KEY (\`squadron_id\`) REFERENCES \`squadrons\`(\`id\`) ON DELETE
            SET NULL ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`slots\`
            ADD CONSTRAINT \`FK_d3b275f5b7992f1b8f315032b8a\` FOREIGN KEY (\`cycle_id\`) REFERENCES \`cycles\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`slots\`
            ADD CONSTRAINT \`FK_e2a565a73710a288880d1ab0525\` FOREIGN KEY (\`aircraft_id\`) REFERENCES \`aircraft\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`slots\`
            ADD CONSTRAINT \`FK_85ef05f8cce4d600980d1fd70ef\` FOREIGN KEY (\`pilot_id\`) REFERENCES \`users\`(\`id\`) ON DELETE
            SET NULL ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`slots\`
            ADD CONSTRAINT \`FK_acb575174a4c81dbbca797e1a79\` FOREIGN KEY (\`catapult_id\`) REFERENCES \`catapults\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`slots\`
            ADD CONSTRAINT \`FK_741290c4a1e467d4e7b7888ef5d\` FOREIGN KEY (\`status_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE
            SET NULL ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`refresh_tokens\`
            ADD CONSTRAINT \`FK_3ddc983c5f7bcf132fd8732c3f4\` FOREIGN KEY (\`user_id\`) REFERENCES \`users\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`refresh_tokens\` DROP FOREIGN KEY \`FK_3ddc983c5f7bcf132fd8732c3f4\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`slots\` DROP FOREIGN KEY \`FK_741290c4a1e467d4e7b7888ef5d\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`slots\` DROP FOREIGN KEY \`FK_acb575174a4c81dbbca797e1a79\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`slots\` DROP FOREIGN KEY \`FK_85ef05f8cce4d600980d1fd70ef\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`slots\` DROP FOREIGN KEY \`FK_e2a565a73710a288880d1ab0525\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`slots\` DROP FOREIGN KEY \`FK_d3b275f5b7992f1b8f315032b8a\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`users\` DROP FOREIGN KEY \`FK_bf7bdd3cdaae529a352d641571e\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`users\` DROP FOREIGN KEY \`FK_e9c53c4cfdf41d198fd27ef198e\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`cycle_changes\` DROP FOREIGN KEY \`FK_73c8b4bba7e07571306c02f35ad\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`cycles\` DROP FOREIGN KEY \`FK_77610ea418ad42e451ce0ce3736\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`catapults\` DROP FOREIGN KEY \`FK_289c5dda05c99d566c058eb7ab8\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`aircraft\` DROP FOREIGN KEY \`FK_d8681cc62d89fceae071a74437d\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`aircraft\` DROP FOREIGN KEY \`FK_48233365948450420f62c447a06\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_a7838d2ba25be1342091b6695f\` ON \`refresh_tokens\`
        `);
    await queryRunner.query(`
            DROP TABLE \`refresh_tokens\`
        `);
    await queryRunner.query(`
            DROP INDEX \`uq_slots_cycle_aircraft\` ON \`slots\`
        `);
    await queryRunner.query(`
            DROP INDEX \`uq_slots_launch_key\` ON \`slots\`
        `);
    await queryRunner.query(`
            DROP INDEX \`ix_slots_lane\` ON \`slots\`
        `);
    await queryRunner.query(`
            DROP TABLE \`slots\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_97672ac88f789774dd47f7c8be\` ON \`users\`
        `);
    await queryRunner.query(`
            DROP TABLE \`users\`
        `);
    await queryRunner.query(`
            DROP INDEX \`uq_cycle_changes_version\` ON \`cycle_changes\`
        `);
    await queryRunner.query(`
            DROP TABLE \`cycle_changes\`
        `);
    await queryRunner.query(`
            DROP INDEX \`uq_cycles_ship_number\` ON \`cycles\`
        `);
    await queryRunner.query(`
            DROP TABLE \`cycles\`
        `);
    await queryRunner.query(`
            DROP TABLE \`ships\`
        `);
    await queryRunner.query(`
            DROP INDEX \`uq_catapults_ship_number\` ON \`catapults\`
        `);
    await queryRunner.query(`
            DROP TABLE \`catapults\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_f1de2167c5711f751172c1e70e\` ON \`aircraft\`
        `);
    await queryRunner.query(`
            DROP TABLE \`aircraft\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_9a169f17ef614da0e9a6d0e98e\` ON \`squadrons\`
        `);
    await queryRunner.query(`
            DROP TABLE \`squadrons\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_fc8d7e38875546d38c5338fda7\` ON \`aircraft_types\`
        `);
    await queryRunner.query(`
            DROP TABLE \`aircraft_types\`
        `);
  }
}
