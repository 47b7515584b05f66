import { MigrationInterface, QueryRunner } from "typeorm";

export class SessionsLimits1796189810876 implements MigrationInterface {
    name = 'SessionsLimits1796189810876'

    public async up(queryRunner: QueryRunner): Promise<void> {
        // The shared rate-limit counters (rate-limiter-flexible's PostgreSQL store, in its own layout).
        // No entity: nothing but the limiter reads it, and the app never lets the library create it at run time.
        await queryRunner.query(`
            CREATE TABLE "rate_limits" (
                "key" character varying(255) NOT NULL,
                "points" integer NOT NULL DEFAULT 0,
                "expire" bigint,
                CONSTRAINT "rate_limits_pkey" PRIMARY KEY ("key")
            )
        `);
        await queryRunner.query(`
            CREATE INDEX "rate_limits_expire" ON "rate_limits" ("expire")
        `);
        await queryRunner.query(`
            CREATE TABLE "auth_sessions" (
                "id" uuid NOT NULL DEFAULT gen_random_uuid(),
                "user_id" uuid NOT NULL,
                "token_hash" character varying(64) NOT NULL,
                "previous_hash" character varying(64),
                "rotated_at" TIMESTAMP WITH TIME ZONE,
                "device" character varying(80) NOT NULL,
                "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                "last_used_at" TIMESTAMP WITH TIME ZONE NOT NULL,
                "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL,
                "ended_at" TIMESTAMP WITH TIME ZONE,
                "end_reason" character varying(16),
                CONSTRAINT "PK_641507381f32580e8479efc36cd" PRIMARY KEY ("id")
            )
        `);
        await queryRunner.query(`
            CREATE INDEX "auth_sessions_user" ON "auth_sessions" ("user_id")
        `);
        await queryRunner.query(`
            CREATE TABLE "email_changes" (
                "id" uuid NOT NULL DEFAULT gen_random_uuid(),
                "user_id" uuid NOT NULL,
                "old_email" character varying(254) NOT NULL,
                "new_email" character varying(254) NOT NULL,
                "token_hash" character varying(64) NOT NULL,
                "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL,
                "undone_at" TIMESTAMP WITH TIME ZONE,
                "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                CONSTRAINT "PK_6626b2af49c359b24442c10bbb1" PRIMARY KEY ("id")
            )
        `);
        await queryRunner.query(`
            CREATE INDEX "email_changes_user" ON "email_changes" ("user_id")
        `);
        await queryRunner.query(`
            CREATE UNIQUE INDEX "email_changes_hash_unique" ON "email_changes" ("token_hash")
        `);
        await queryRunner.query(`
            ALTER TABLE "auth_sessions"
            ADD CONSTRAINT "FK_50ccaa6440288a06f0ba693ccc6" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
        await queryRunner.query(`
            ALTER TABLE "email_changes"
            ADD CONSTRAINT "FK_38edd6558e3b8386e9297c2636e" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION
        `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`
            ALTER TABLE "email_changes" DROP CONSTRAINT "FK_38edd6558e3b8386e9297c2636e"
        `);
        await queryRunner.query(`
            ALTER TABLE "auth_sessions" DROP CONSTRAINT "FK_50ccaa6440288a06f0ba693ccc6"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."email_changes_hash_unique"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."email_changes_user"
        `);
        await queryRunner.query(`
            DROP TABLE "email_changes"
        `);
        await queryRunner.query(`
            DROP INDEX "public"."auth_sessions_user"
        `);
        await queryRunner.query(`
            DROP TABLE "auth_sessions"
        `);
        await queryRunner.query(`
            DROP TABLE "rate_limits"
        `);
    }

}
