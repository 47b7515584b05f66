import { MigrationInterface, QueryRunner } from "typeorm";

export class PhotosSharesInvites1796168284344 implements MigrationInterface {
    name = 'PhotosSharesInvites1796168284344'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`
            CREATE TABLE "crew_invites" (
                "id" uuid NOT NULL DEFAULT gen_random_uuid(),
                "hunt_id" uuid NOT NULL,
                "invited_by" uuid NOT NULL,
                "email" character varying(254) NOT NULL,
                "token_hash" character varying(64) NOT NULL,
                "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL,
                "accepted_at" TIMESTAMP WITH TIME ZONE,
                "accepted_by" uuid,
                "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                CONSTRAINT "PK_99b15b3ee4b89bbcff20627244e" PRIMARY KEY ("id")
            )
        `);
        await queryRunner.query(`
            CREATE INDEX "crew_invites_inviter" ON "crew_invites" ("invited_by")
        `);
        await queryRunner.query(`
            CREATE INDEX "crew_invites_hunt" ON "crew_invites" ("hunt_id")
        `);
        await queryRunner.query(`
            CREATE UNIQUE INDEX "crew_invites_hash_unique" ON "crew_invites" ("token_hash")
        `);
        await queryRunner.query(`
            CREATE TABLE "photos" (
                "id" uuid NOT NULL DEFAULT gen_random_uuid(),
                "keeper_id" uuid NOT NULL,
                "user_id" uuid NOT NULL,
                "side" character varying(5) NOT NULL,
                "content_type" character varying(20) NOT NULL,
                "byte_size" integer NOT NULL,
                "width" integer NOT NULL,
                "height" integer NOT NULL,
                "object_key" character varying(300) NOT NULL,
                "thumb_key" character varying(300) NOT NULL,
                "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                CONSTRAINT "PK_5220c45b8e32d49d767b9b3d725" PRIMARY KEY ("id")
            )
        `);
        await queryRunner.query(`
            CREATE INDEX "photos_user" ON "photos" ("user_id")
        `);
        await queryRunner.query(`
            CREATE UNIQUE INDEX "photos_keeper_side_unique" ON "photos" ("keeper_id", "side")
        `);
        await queryRunner.query(`
            CREATE TABLE "share_links" (
                "id" uuid NOT NULL DEFAULT gen_random_uuid(),
                "keeper_id" uuid NOT NULL,
                "user_id" uuid NOT NULL,
                "token_hash" character varying(64) NOT NULL,
                "revoked_at" TIMESTAMP WITH TIME ZONE,
                "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                CONSTRAINT "PK_70320b79ecd8acab96419fcdd6d" PRIMARY KEY ("id")
            )
        `);
        await queryRunner.query(`
            CREATE INDEX "share_links_user" ON "share_links" ("user_id")
        `);
        await queryRunner.query(`
            CREATE INDEX "share_links_keeper" ON "share_links" ("keeper_id")
        `);
        await queryRunner.query(`
            CREATE UNIQUE INDEX "share_links_hash_unique" ON "share_links" ("token_hash")
        `);
        await queryRunner.query(`
            ALTER TABLE "crew_invites"
            ADD CONSTRAINT "FK_39832beec776912d0e614ef834d" FOREIGN KEY ("hunt_id") REFERENCES "hunts"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "crew_invites"
            ADD CONSTRAINT "FK_273f6bc5cbb1e2fa108713b2303" FOREIGN KEY ("invited_by") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "crew_invites"
            ADD CONSTRAINT "FK_dbd77297aca35bd548bcf75a8b5" FOREIGN KEY ("accepted_by") REFERENCES "users"("id") ON DELETE
            SET NULL ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "photos"
            ADD CONSTRAINT "FK_bde408fe42c4182247bdb9f0858" FOREIGN KEY ("keeper_id") REFERENCES "keepers"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "photos"
            ADD CONSTRAINT "FK_c4404a2ee605249b508c623e68f" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "share_links"
            ADD CONSTRAINT "FK_040badc45aaeb3f47c4bdb127cc" FOREIGN KEY ("keeper_id") REFERENCES "keepers"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "share_links"
            ADD CONSTRAINT "FK_6545cc8f42ed8a2af5652e5e5c7" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`
            ALTER TABLE "share_links" DROP CONSTRAINT "FK_6545cc8f42ed8a2af5652e5e5c7"
        `);
        await queryRunner.query(`
            ALTER TABLE "share_links" DROP CONSTRAINT "FK_040badc45aaeb3f47c4bdb127cc"
        `);
        await queryRunner.query(`
            ALTER TABLE "photos" DROP CONSTRAINT "FK_c4404a2ee605249b508c623e68f"
        `);
        await queryRunner.query(`
            ALTER TABLE "photos" DROP CONSTRAINT "FK_bde408fe42c4182247bdb9f0858"
        `);
        await queryRunner.query(`
            ALTER TABLE "crew_invites" DROP CONSTRAINT "FK_dbd77297aca35bd548bcf75a8b5"
        `);
        await queryRunner.query(`
            ALTER TABLE "crew_invites" DROP CONSTRAINT "FK_273f6bc5cbb1e2fa108713b2303"
        `);
        await queryRunner.query(`
            ALTER TABLE "crew_invites" DROP CONSTRAINT "FK_39832beec776912d0e614ef834d"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."share_links_hash_unique"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."share_links_keeper"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."share_links_user"
        `);
        await queryRunner.query(`
            DROP TABLE "share_links"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."photos_keeper_side_unique"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."photos_user"
        `);
        await queryRunner.query(`
            DROP TABLE "photos"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."crew_invites_hash_unique"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."crew_invites_hunt"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."crew_invites_inviter"
        `);
        await queryRunner.query(`
            DROP TABLE "crew_invites"
        `);
    }

}
