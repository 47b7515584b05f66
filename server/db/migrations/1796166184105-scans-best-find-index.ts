import { MigrationInterface, QueryRunner } from "typeorm";

export class ScansBestFindIndex1796166184105 implements MigrationInterface {
    name = 'ScansBestFindIndex1796166184105'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`
            DROP INDEX "public"."scans_hunt_points"
        `);
        await queryRunner.query(`
            CREATE INDEX "scans_hunt_best" ON "scans" ("hunt_id", "points")
            WHERE "points" > 0
        `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`
            DROP INDEX "public"."scans_hunt_best"
        `);
        await queryRunner.query(`
            CREATE INDEX "scans_hunt_points" ON "scans" USING btree ("hunt_id", "points")
        `);
    }

}
