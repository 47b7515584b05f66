import { MigrationInterface, QueryRunner } from "typeorm";

export class HuntsScansKeepers1796164796469 implements MigrationInterface {
    name = 'HuntsScansKeepers1796164796469'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`
            CREATE TABLE "password_reset_tokens" (
                "id" uuid NOT NULL DEFAULT gen_random_uuid(),
                "user_id" uuid NOT NULL,
                "token_hash" character varying(64) NOT NULL,
                "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL,
                "used_at" TIMESTAMP WITH TIME ZONE,
                "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                CONSTRAINT "PK_d16bebd73e844c48bca50ff8d3d" PRIMARY KEY ("id")
            )
        `);
        await queryRunner.query(`
            CREATE INDEX "password_reset_tokens_user" ON "password_reset_tokens" ("user_id")
        `);
        await queryRunner.query(`
            CREATE UNIQUE INDEX "password_reset_tokens_hash_unique" ON "password_reset_tokens" ("token_hash")
        `);
        await queryRunner.query(`
            CREATE TABLE "hunts" (
                "id" uuid NOT NULL DEFAULT gen_random_uuid(),
                "owner_id" uuid NOT NULL,
                "title" character varying(120) NOT NULL,
                "source" character varying(120) NOT NULL,
                "denomination" integer NOT NULL,
                "planned_straps" integer NOT NULL,
                "status" character varying(8) NOT NULL DEFAULT 'open',
                "started_at" TIMESTAMP WITH TIME ZONE NOT NULL,
                "closed_at" TIMESTAMP WITH TIME ZONE,
                "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                CONSTRAINT "PK_663645859ac175502083c9e1cea" PRIMARY KEY ("id")
            )
        `);
        await queryRunner.query(`
            CREATE INDEX "hunts_owner" ON "hunts" ("owner_id")
        `);
        await queryRunner.query(`
            CREATE TABLE "hunt_members" (
                "hunt_id" uuid NOT NULL,
                "user_id" uuid NOT NULL,
                "role" character varying(8) NOT NULL,
                "joined_at" TIMESTAMP WITH TIME ZONE NOT NULL,
                CONSTRAINT "PK_dc15095908243ec7b1bbabcbfd8" PRIMARY KEY ("hunt_id", "user_id")
            )
        `);
        await queryRunner.query(`
            CREATE INDEX "hunt_members_user" ON "hunt_members" ("user_id")
        `);
        await queryRunner.query(`
            CREATE TABLE "scans" (
                "id" uuid NOT NULL,
                "hunt_id" uuid NOT NULL,
                "user_id" uuid NOT NULL,
                "strap" integer NOT NULL,
                "serial" character varying(40) NOT NULL,
                "digits" character varying(8) NOT NULL,
                "value" integer NOT NULL,
                "prefix" character varying(2) NOT NULL,
                "suffix" character varying(1) NOT NULL,
                "star" boolean NOT NULL,
                "district" character varying(1),
                "pulled" boolean NOT NULL,
                "pattern_mask" integer NOT NULL,
                "points" double precision NOT NULL,
                "keep" boolean NOT NULL,
                "scanned_at" TIMESTAMP WITH TIME ZONE NOT NULL,
                "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                CONSTRAINT "PK_41156c08314b9e541c1cb18c588" PRIMARY KEY ("id")
            )
        `);
        await queryRunner.query(`
            CREATE INDEX "scans_user" ON "scans" ("user_id")
        `);
        await queryRunner.query(`
            CREATE INDEX "scans_hunt_points" ON "scans" ("hunt_id", "points")
        `);
        await queryRunner.query(`
            CREATE INDEX "scans_hunt_time" ON "scans" ("hunt_id", "scanned_at", "id")
        `);
        await queryRunner.query(`
            CREATE TABLE "keepers" (
                "id" uuid NOT NULL DEFAULT gen_random_uuid(),
                "user_id" uuid NOT NULL,
                "scan_id" uuid,
                "hunt_id" uuid,
                "serial" character varying(40) NOT NULL,
                "digits" character varying(8) NOT NULL,
                "prefix" character varying(2) NOT NULL,
                "suffix" character varying(1) NOT NULL,
                "star" boolean NOT NULL,
                "series" character varying(8),
                "district" character varying(1),
                "facility" character varying(2),
                "denomination" integer,
                "grade" smallint,
                "estimated_value_cents" integer,
                "status" character varying(8) NOT NULL DEFAULT 'kept',
                "notes" text,
                "pattern_mask" integer NOT NULL,
                "points" double precision NOT NULL,
                "found_at" TIMESTAMP WITH TIME ZONE NOT NULL,
                "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                CONSTRAINT "PK_a0979213cf0f95bf6fdd6c172cf" PRIMARY KEY ("id")
            )
        `);
        await queryRunner.query(`
            CREATE INDEX "keepers_hunt" ON "keepers" ("hunt_id")
        `);
        await queryRunner.query(`
            CREATE INDEX "keepers_scan" ON "keepers" ("scan_id")
        `);
        await queryRunner.query(`
            CREATE UNIQUE INDEX "keepers_user_scan_unique" ON "keepers" ("user_id", "scan_id")
        `);
        await queryRunner.query(`
            CREATE INDEX "keepers_user_found" ON "keepers" ("user_id", "found_at", "id")
        `);
        await queryRunner.query(`
            CREATE TABLE "scan_tombstones" (
                "id" uuid NOT NULL,
                "user_id" uuid NOT NULL,
                "deleted_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                CONSTRAINT "PK_8f1cc2bb398e6d94550e5228801" PRIMARY KEY ("id")
            )
        `);
        await queryRunner.query(`
            CREATE INDEX "scan_tombstones_user" ON "scan_tombstones" ("user_id")
        `);
        await queryRunner.query(`
            CREATE TABLE "straps" (
                "hunt_id" uuid NOT NULL,
                "number" integer NOT NULL,
                "swapped_in" integer NOT NULL DEFAULT '0',
                "short_over" integer NOT NULL DEFAULT '0',
                "note" character varying(200),
                "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                CONSTRAINT "PK_ebb65648d301eff0cf2e57dd5a8" PRIMARY KEY ("hunt_id", "number")
            )
        `);
        await queryRunner.query(`
            CREATE TABLE "watch_patterns" (
                "id" uuid NOT NULL DEFAULT gen_random_uuid(),
                "user_id" uuid NOT NULL,
                "text" character varying(64) NOT NULL,
                "label" character varying(60),
                "pattern" jsonb NOT NULL,
                "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                CONSTRAINT "PK_4067fdbf258d7ecf58b56627793" PRIMARY KEY ("id")
            )
        `);
        await queryRunner.query(`
            CREATE UNIQUE INDEX "watch_patterns_user_text_unique" ON "watch_patterns" ("user_id", "text")
        `);
        await queryRunner.query(`
            CREATE TABLE "weight_tables" (
                "id" uuid NOT NULL DEFAULT gen_random_uuid(),
                "user_id" uuid NOT NULL,
                "name" character varying(60) NOT NULL,
                "active" boolean NOT NULL DEFAULT false,
                "weights" jsonb NOT NULL,
                "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                CONSTRAINT "PK_f3e47d8e3469f2b49e1b771ee55" PRIMARY KEY ("id")
            )
        `);
        await queryRunner.query(`
            CREATE UNIQUE INDEX "weight_tables_one_active" ON "weight_tables" ("user_id")
            WHERE "active"
        `);
        await queryRunner.query(`
            CREATE UNIQUE INDEX "weight_tables_user_name_unique" ON "weight_tables" ("user_id", "name")
        `);
        await queryRunner.query(`
            ALTER TABLE "password_reset_tokens"
            ADD CONSTRAINT "FK_52ac39dd8a28730c63aeb428c9c" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "hunts"
            ADD CONSTRAINT "FK_5a15c3e6ad06fcbd6c8a609c257" FOREIGN KEY ("owner_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "hunt_members"
            ADD CONSTRAINT "FK_fd460a3266c00e3fa9160b12121" FOREIGN KEY ("hunt_id") REFERENCES "hunts"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "hunt_members"
            ADD CONSTRAINT "FK_c9b40934f2a143f0288932d1d0a" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "scans"
            ADD CONSTRAINT "FK_f4faefd7e129cdecb872856f1d7" FOREIGN KEY ("hunt_id") REFERENCES "hunts"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "scans"
            ADD CONSTRAINT "FK_b1d041293c86a1bfbd15c559385" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "keepers"
            ADD CONSTRAINT "FK_030b8f58e29beb32e51bbcd5427" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "keepers"
            ADD CONSTRAINT "FK_33e348edf5e4db758e6ca26d4a2" FOREIGN KEY ("scan_id") REFERENCES "scans"("id") ON DELETE
            SET NULL ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "keepers"
            ADD CONSTRAINT "FK_f5bc63cf2c2aed2d490501f8885" FOREIGN KEY ("hunt_id") REFERENCES "hunts"("id") ON DELETE
            SET NULL ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "scan_tombstones"
            ADD CONSTRAINT "FK_822b978851cbb6d3b5c55e3d648" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "straps"
            ADD CONSTRAINT "FK_bb1aa5d46274770ee6e71d0df25" FOREIGN KEY ("hunt_id") REFERENCES "hunts"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "watch_patterns"
            ADD CONSTRAINT "FK_068611192a1f4a47e7a0920f651" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "weight_tables"
            ADD CONSTRAINT "FK_66b598ba54e5b24d692f78801c4" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`
            ALTER TABLE "weight_tables" DROP CONSTRAINT "FK_66b598ba54e5b24d692f78801c4"
        `);
        await queryRunner.query(`
            ALTER TABLE "watch_patterns" DROP CONSTRAINT "FK_068611192a1f4a47e7a0920f651"
        `);
        await queryRunner.query(`
            ALTER TABLE "straps" DROP CONSTRAINT "FK_bb1aa5d46274770ee6e71d0df25"
        `);
        await queryRunner.query(`
            ALTER TABLE "scan_tombstones" DROP CONSTRAINT "FK_822b978851cbb6d3b5c55e3d648"
        `);
        await queryRunner.query(`
            ALTER TABLE "keepers" DROP CONSTRAINT "FK_f5bc63cf2c2aed2d490501f8885"
        `);
        await queryRunner.query(`
            ALTER TABLE "keepers" DROP CONSTRAINT "FK_33e348edf5e4db758e6ca26d4a2"
        `);
        await queryRunner.query(`
            ALTER TABLE "keepers" DROP CONSTRAINT "FK_030b8f58e29beb32e51bbcd5427"
        `);
        await queryRunner.query(`
            ALTER TABLE "scans" DROP CONSTRAINT "FK_b1d041293c86a1bfbd15c559385"
        `);
        await queryRunner.query(`
            ALTER TABLE "scans" DROP CONSTRAINT "FK_f4faefd7e129cdecb872856f1d7"
        `);
        await queryRunner.query(`
            ALTER TABLE "hunt_members" DROP CONSTRAINT "FK_c9b40934f2a143f0288932d1d0a"
        `);
        await queryRunner.query(`
            ALTER TABLE "hunt_members" DROP CONSTRAINT "FK_fd460a3266c00e3fa9160b12121"
        `);
        await queryRunner.query(`
            ALTER TABLE "hunts" DROP CONSTRAINT "FK_5a15c3e6ad06fcbd6c8a609c257"
        `);
        await queryRunner.query(`
            ALTER TABLE "password_reset_tokens" DROP CONSTRAINT "FK_52ac39dd8a28730c63aeb428c9c"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."weight_tables_user_name_unique"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."weight_tables_one_active"
        `);
        await queryRunner.query(`
            DROP TABLE "weight_tables"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."watch_patterns_user_text_unique"
        `);
        await queryRunner.query(`
            DROP TABLE "watch_patterns"
        `);
        await queryRunner.query(`
            DROP TABLE "straps"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."scan_tombstones_user"
        `);
        await queryRunner.query(`
            DROP TABLE "scan_tombstones"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."keepers_user_found"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."keepers_user_scan_unique"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."keepers_scan"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."keepers_hunt"
        `);
        await queryRunner.query(`
            DROP TABLE "keepers"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."scans_hunt_time"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."scans_hunt_points"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."scans_user"
        `);
        await queryRunner.query(`
            DROP TABLE "scans"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."hunt_members_user"
        `);
        await queryRunner.query(`
            DROP TABLE "hunt_members"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."hunts_owner"
        `);
        await queryRunner.query(`
            DROP TABLE "hunts"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."password_reset_tokens_hash_unique"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."password_reset_tokens_user"
        `);
        await queryRunner.query(`
            DROP TABLE "password_reset_tokens"
        `);
    }

}
