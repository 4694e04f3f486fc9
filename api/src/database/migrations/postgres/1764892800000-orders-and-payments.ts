import type { MigrationInterface, QueryRunner } from 'typeorm';

/** PostgreSQL twin of `../1764892800000-orders-and-payments.ts` (see there for the why). */
export class OrdersAndPayments1764892800000 implements MigrationInterface {
  name = 'OrdersAndPayments1764892800000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "orders" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "reference" varchar(20) NOT NULL,
        "client_id" varchar(36) NOT NULL,
        "menu_id" varchar(36) NOT NULL,
        "status" varchar(20) NOT NULL,
        "event_date" varchar(10) NOT NULL,
        "service_time" varchar(5) NOT NULL,
        "venue_address_lines" text NOT NULL,
        "occasion" varchar(120) NOT NULL,
        "contact_phone" varchar(20) NOT NULL,
        "guest_count" integer NOT NULL,
        "plates" integer NOT NULL,
        "currency" varchar(3) NOT NULL,
        "total_minor" integer NOT NULL,
        "retained_minor" integer NOT NULL DEFAULT 0,
        "pricing" text NOT NULL,
        "quote" text NOT NULL,
        "client_request_id" varchar(64) NOT NULL,
        "request_hash" varchar(64) NOT NULL,
        "hold_expires_at" timestamptz,
        "amount_version" integer NOT NULL DEFAULT 1,
        "created_at" timestamptz NOT NULL DEFAULT now(),
        "updated_at" timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT "FK_505ba3689ef2763acd6c4fc93a4" FOREIGN KEY ("client_id") REFERENCES "users" ("id") ON DELETE RESTRICT,
        CONSTRAINT "FK_3eee574adcc7aac201aa0052274" FOREIGN KEY ("menu_id") REFERENCES "menus" ("id") ON DELETE RESTRICT,
        CONSTRAINT "CHK_orders_status" CHECK ("status" IN ('pending_payment', 'requested', 'confirmed', 'completed', 'expired', 'declined', 'cancelled')),
        CONSTRAINT "CHK_orders_guest_count" CHECK ("guest_count" >= 1),
        CONSTRAINT "CHK_orders_plates" CHECK ("plates" >= 1),
        CONSTRAINT "CHK_orders_total" CHECK ("total_minor" >= 0),
        CONSTRAINT "CHK_orders_retained" CHECK ("retained_minor" >= 0)
      )`);
    await queryRunner.query(`CREATE UNIQUE INDEX "UQ_orders_reference" ON "orders" ("reference")`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_orders_client_request" ON "orders" ("client_id", "client_request_id")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_orders_event_date_status" ON "orders" ("event_date", "status")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_orders_status" ON "orders" ("status", "created_at")`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_orders_menu" ON "orders" ("menu_id")`);

    await queryRunner.query(`
      CREATE TABLE "order_guests" (
        "order_id" varchar(36) NOT NULL,
        "position" integer NOT NULL,
        "label" varchar(120) NOT NULL,
        "table_label" varchar(40),
        "allergens" text NOT NULL,
        "diets" text NOT NULL,
        "notes" varchar(500),
        PRIMARY KEY ("order_id", "position"),
        CONSTRAINT "FK_7161a5b6488936cb8301e087d65" FOREIGN KEY ("order_id") REFERENCES "orders" ("id") ON DELETE CASCADE,
        CONSTRAINT "CHK_order_guests_position" CHECK ("position" >= 0)
      )`);

    await queryRunner.query(`
      CREATE TABLE "order_events" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "order_id" varchar(36) NOT NULL,
        "seq" integer NOT NULL,
        "actor_user_id" varchar(36),
        "actor_role" varchar(8) NOT NULL,
        "from_status" varchar(20),
        "to_status" varchar(20),
        "summary" varchar(300) NOT NULL,
        "reason" varchar(500),
        "at" timestamptz NOT NULL,
        CONSTRAINT "FK_b33cbf9a59cbee112d94bcb59de" FOREIGN KEY ("order_id") REFERENCES "orders" ("id") ON DELETE RESTRICT,
        CONSTRAINT "FK_6de21c12ce26e84e404a1c57ae2" FOREIGN KEY ("actor_user_id") REFERENCES "users" ("id") ON DELETE SET NULL,
        CONSTRAINT "CHK_order_events_seq" CHECK ("seq" >= 1),
        CONSTRAINT "CHK_order_events_actor_role" CHECK ("actor_role" IN ('client', 'chef', 'staff', 'system'))
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_order_events_order_seq" ON "order_events" ("order_id", "seq")`,
    );

    await queryRunner.query(`
      CREATE TABLE "payments" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "order_id" varchar(36) NOT NULL,
        "kind" varchar(8) NOT NULL,
        "status" varchar(10) NOT NULL,
        "amount_minor" integer NOT NULL,
        "currency" varchar(3) NOT NULL,
        "idempotency_key" varchar(200) NOT NULL,
        "provider_session_id" varchar(255),
        "checkout_url" varchar(2000),
        "checkout_expires_at" timestamptz,
        "provider_payment_intent_id" varchar(255),
        "provider_refund_id" varchar(255),
        "refund_of_payment_id" varchar(36),
        "operation" varchar(16),
        "target_guest_count" integer,
        "failure_message" varchar(300),
        "seeded" boolean NOT NULL DEFAULT false,
        "created_at" timestamptz NOT NULL,
        "settled_at" timestamptz,
        "updated_at" timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT "FK_b2f7b823a21562eeca20e72b006" FOREIGN KEY ("order_id") REFERENCES "orders" ("id") ON DELETE RESTRICT,
        CONSTRAINT "FK_ad891ea1daa593cee59859abee5" FOREIGN KEY ("refund_of_payment_id") REFERENCES "payments" ("id") ON DELETE RESTRICT,
        CONSTRAINT "CHK_payments_kind" CHECK ("kind" IN ('deposit', 'full', 'balance', 'top_up', 'refund')),
        CONSTRAINT "CHK_payments_status" CHECK ("status" IN ('pending', 'succeeded', 'failed', 'expired')),
        CONSTRAINT "CHK_payments_amount" CHECK ("amount_minor" > 0),
        CONSTRAINT "CHK_payments_refund_of" CHECK (("kind" = 'refund') = ("refund_of_payment_id" IS NOT NULL))
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_payments_idempotency_key" ON "payments" ("idempotency_key")`,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_payments_session" ON "payments" ("provider_session_id")`,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_payments_refund" ON "payments" ("provider_refund_id")`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_payments_order" ON "payments" ("order_id")`);
    await queryRunner.query(
      `CREATE INDEX "IDX_payments_intent" ON "payments" ("provider_payment_intent_id")`,
    );

    await queryRunner.query(`
      CREATE TABLE "processed_webhook_events" (
        "event_id" varchar(255) PRIMARY KEY NOT NULL,
        "type" varchar(100) NOT NULL,
        "processed_at" timestamptz NOT NULL
      )`);

    await queryRunner.query(`
      CREATE TABLE "outbox_messages" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "kind" varchar(40) NOT NULL,
        "order_id" varchar(36),
        "to_address" varchar(254) NOT NULL,
        "subject" varchar(300) NOT NULL,
        "text_body" text NOT NULL,
        "html_body" text NOT NULL,
        "attachments" text NOT NULL DEFAULT '[]',
        "status" varchar(8) NOT NULL,
        "attempts" integer NOT NULL DEFAULT 0,
        "next_attempt_at" timestamptz NOT NULL,
        "sent_at" timestamptz,
        "last_error" varchar(500),
        "created_at" timestamptz NOT NULL,
        "updated_at" timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT "FK_4693703fad830e15a00a3c9020c" FOREIGN KEY ("order_id") REFERENCES "orders" ("id") ON DELETE SET NULL,
        CONSTRAINT "CHK_outbox_messages_status" CHECK ("status" IN ('pending', 'sending', 'sent', 'failed'))
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_outbox_due" ON "outbox_messages" ("status", "next_attempt_at")`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_outbox_due"`);
    await queryRunner.query(`DROP TABLE "outbox_messages"`);
    await queryRunner.query(`DROP TABLE "processed_webhook_events"`);
    await queryRunner.query(`DROP INDEX "IDX_payments_intent"`);
    await queryRunner.query(`DROP INDEX "IDX_payments_order"`);
    await queryRunner.query(`DROP INDEX "UQ_payments_refund"`);
    await queryRunner.query(`DROP INDEX "UQ_payments_session"`);
    await queryRunner.query(`DROP INDEX "UQ_payments_idempotency_key"`);
    await queryRunner.query(`DROP TABLE "payments"`);
    await queryRunner.query(`DROP INDEX "UQ_order_events_order_seq"`);
    await queryRunner.query(`DROP TABLE "order_events"`);
    await queryRunner.query(`DROP TABLE "order_guests"`);
    await queryRunner.query(`DROP INDEX "IDX_orders_menu"`);
    await queryRunner.query(`DROP INDEX "IDX_orders_status"`);
    await queryRunner.query(`DROP INDEX "IDX_orders_event_date_status"`);
    await queryRunner.query(`DROP INDEX "UQ_orders_client_request"`);
    await queryRunner.query(`DROP INDEX "UQ_orders_reference"`);
    await queryRunner.query(`DROP TABLE "orders"`);
  }
}
