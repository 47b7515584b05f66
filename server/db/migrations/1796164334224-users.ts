import { MigrationInterface, QueryRunner } from "typeorm";

export class Users1796164334224 implements MigrationInterface {
    name = 'Users1796164334224'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`
            CREATE TABLE "users" (
                "id" uuid NOT NULL DEFAULT gen_random_uuid(),
                "email" character varying(254) NOT NULL,
                "password_hash" character varying(255) NOT NULL,
                "display_name" character varying(80) NOT NULL,
                "role" character varying(16) NOT NULL DEFAULT 'collector',
                "disabled" boolean NOT NULL DEFAULT false,
                "token_version" integer NOT NULL DEFAULT '0',
                "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(),
                CONSTRAINT "PK_a3ffb1c0c8416b9fc6f907b7433" PRIMARY KEY ("id")
            )
        `);
        await queryRunner.query(`
            CREATE UNIQUE INDEX "users_email_unique" ON "users" ("email")
        `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`
            DROP INDEX "public"."users_email_unique"
        `);
        await queryRunner.query(`
            DROP TABLE "users"
        `);
    }

}
