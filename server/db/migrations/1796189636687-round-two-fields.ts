import { MigrationInterface, QueryRunner } from "typeorm";

export class RoundTwoFields1796189636687 implements MigrationInterface {
    name = 'RoundTwoFields1796189636687'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`
            ALTER TABLE "hunts"
            ADD "in_sequence" boolean NOT NULL DEFAULT false
        `);
        await queryRunner.query(`
            ALTER TABLE "hunts"
            ADD "series" character varying(8)
        `);
        await queryRunner.query(`
            ALTER TABLE "scans"
            ADD "entry_method" character varying(8) NOT NULL DEFAULT 'keypad'
        `);
        await queryRunner.query(`
            ALTER TABLE "scans"
            ADD "camera_confidence" real
        `);
        await queryRunner.query(`
            ALTER TABLE "scans"
            ADD "star_run_size" integer
        `);
        await queryRunner.query(`
            ALTER TABLE "keepers"
            ADD "original_paper" boolean
        `);
        await queryRunner.query(`
            ALTER TABLE "keepers"
            ADD "star_run_size" integer
        `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`
            ALTER TABLE "keepers" DROP COLUMN "star_run_size"
        `);
        await queryRunner.query(`
            ALTER TABLE "keepers" DROP COLUMN "original_paper"
        `);
        await queryRunner.query(`
            ALTER TABLE "scans" DROP COLUMN "star_run_size"
        `);
        await queryRunner.query(`
            ALTER TABLE "scans" DROP COLUMN "camera_confidence"
        `);
        await queryRunner.query(`
            ALTER TABLE "scans" DROP COLUMN "entry_method"
        `);
        await queryRunner.query(`
            ALTER TABLE "hunts" DROP COLUMN "series"
        `);
        await queryRunner.query(`
            ALTER TABLE "hunts" DROP COLUMN "in_sequence"
        `);
    }

}
