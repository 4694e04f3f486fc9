import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Bookings and their money: orders (with the price snapshot and quote they were booked with),
 * one row per guest requirement, the audit trail of every change, the payment ledger, the
 * webhook events already applied, and the e-mail outbox. Money is integer minor units. An order
 * keeps its client and menu (ON DELETE RESTRICT); a ledger row and an audit row are never
 * deleted with anything.
 */
export class OrdersAndPayments1764892800000 implements MigrationInterface {
  name = 'OrdersAndPayments1764892800000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "orders" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "reference" varchar(20) NOT NULL,
        "client_id" varchar(36) NOT NULL REFERENCES "users" ("id") ON DELETE RESTRICT,
        "menu_id" varchar(36) NOT NULL REFERENCES "menus" ("id") ON DELETE RESTRICT,
        "status" varchar(20) NOT NULL CHECK ("status" IN ('pending_payment', 'requested', 'confirmed', 'completed', 'expired', 'declined', 'cancelled')),
        "event_date" varchar(10) NOT NULL,
        "service_time" varchar(5) NOT NULL,
        "venue_address_lines" text NOT NULL,
        "occasion" varchar(120) NOT NULL,
        "contact_phone" varchar(20) NOT NULL,
        "guest_count" integer NOT NULL CHECK ("guest_count" >= 1),
        "plates" integer NOT NULL CHECK ("plates" >= 1),
        "currency" varchar(3) NOT NULL,
        "total_minor" integer NOT NULL CHECK ("total_minor" >= 0),
        "retained_minor" integer NOT NULL DEFAULT (0) CHECK ("retained_minor" >= 0),
        "pricing" text NOT NULL,
        "quote" text NOT NULL,
        "client_request_id" varchar(64) NOT NULL,
        "request_hash" varchar(64) NOT NULL,
        "hold_expires_at" datetime,
        "amount_version" integer NOT NULL DEFAULT (1),
        "created_at" datetime NOT NULL DEFAULT (datetime('now')),
        "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
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
        "order_id" varchar(36) NOT NULL REFERENCES "orders" ("id") ON DELETE CASCADE,
        "position" integer NOT NULL CHECK ("position" >= 0),
        "label" varchar(120) NOT NULL,
        "table_label" varchar(40),
        "allergens" text NOT NULL,
        "diets" text NOT NULL,
        "notes" varchar(500),
        PRIMARY KEY ("order_id", "position")
      )`);

    await queryRunner.query(`
      CREATE TABLE "order_events" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "order_id" varchar(36) NOT NULL REFERENCES "orders" ("id") ON DELETE RESTRICT,
        "seq" integer NOT NULL CHECK ("seq" >= 1),
        "actor_user_id" varchar(36) REFERENCES "users" ("id") ON DELETE SET NULL,
        "actor_role" varchar(8) NOT NULL CHECK ("actor_role" IN ('client', 'chef', 'staff', 'system')),
        "from_status" varchar(20),
        "to_status" varchar(20),
        "summary" varchar(300) NOT NULL,
        "reason" varchar(500),
        "at" datetime NOT NULL
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_order_events_order_seq" ON "order_events" ("order_id", "seq")`,
    );

    await queryRunner.query(`
      CREATE TABLE "payments" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "order_id" varchar(36) NOT NULL REFERENCES "orders" ("id") ON DELETE RESTRICT,
        "kind" varchar(8) NOT NULL CHECK ("kind" IN ('deposit', 'full', 'balance', 'top_up', 'refund')),
        "status" varchar(10) NOT NULL CHECK ("status" IN ('pending', 'succeeded', 'failed', 'expired')),
        "amount_minor" integer NOT NULL CHECK ("amount_minor" > 0),
        "currency" varchar(3) NOT NULL,
        "idempotency_key" varchar(200) NOT NULL,
        "provider_session_id" varchar(255),
        "checkout_url" varchar(2000),
        "checkout_expires_at" datetime,
        "provider_payment_intent_id" varchar(255),
        "provider_refund_id" varchar(255),
        "refund_of_payment_id" varchar(36) REFERENCES "payments" ("id") ON DELETE RESTRICT,
        "operation" varchar(16),
        "target_guest_count" integer,
        "failure_message" varchar(300),
        "seeded" boolean NOT NULL DEFAULT (0) CHECK ("seeded" IN (0, 1)),
        "created_at" datetime NOT NULL,
        "settled_at" datetime,
        "updated_at" datetime NOT NULL DEFAULT (datetime('now')),
        CHECK (("kind" = 'refund') = ("refund_of_payment_id" IS NOT NULL))
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
        "processed_at" datetime NOT NULL
      )`);

    await queryRunner.query(`
      CREATE TABLE "outbox_messages" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "kind" varchar(40) NOT NULL,
        "order_id" varchar(36) REFERENCES "orders" ("id") ON DELETE SET NULL,
        "to_address" varchar(254) NOT NULL,
        "subject" varchar(300) NOT NULL,
        "text_body" text NOT NULL,
        "html_body" text NOT NULL,
        "attachments" text NOT NULL DEFAULT ('[]'),
        "status" varchar(8) NOT NULL CHECK ("status" IN ('pending', 'sending', 'sent', 'failed')),
        "attempts" integer NOT NULL DEFAULT (0),
        "next_attempt_at" datetime NOT NULL,
        "sent_at" datetime,
        "last_error" varchar(500),
        "created_at" datetime NOT NULL,
        "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
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
