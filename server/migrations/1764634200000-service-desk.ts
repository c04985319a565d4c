import { MigrationInterface, QueryRunner } from 'typeorm';

/** The service desk: shop settings for quotes, quotes with lines and status history, card payments and handled webhooks. */
export class ServiceDesk1764634200000 implements MigrationInterface {
  name = 'ServiceDesk1764634200000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "shop_settings" (
      "id" INTEGER PRIMARY KEY NOT NULL CHECK ("id" = 1),
      "labourRateCentsPerHour" INTEGER NOT NULL CHECK ("labourRateCentsPerHour" > 0),
      "taxBasisPoints" INTEGER NOT NULL CHECK ("taxBasisPoints" BETWEEN 0 AND 10000),
      "deposit" TEXT NOT NULL CHECK (json_valid("deposit")),
      "operations" TEXT NOT NULL CHECK (json_valid("operations")),
      "quoteValidityDays" INTEGER NOT NULL CHECK ("quoteValidityDays" > 0),
      "cautions" TEXT NOT NULL DEFAULT '',
      "updatedById" INTEGER REFERENCES "user" ("id") ON DELETE SET NULL,
      "updatedAt" DATETIME NOT NULL
    )`);

    const statuses = `'draft', 'sent', 'accepted', 'declined', 'deposit-paid', 'booked', 'fitted', 'cancelled', 'expired', 'superseded'`;
    await q.query(`CREATE TABLE "quote" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "number" TEXT NOT NULL,
      "year" INTEGER NOT NULL,
      "sequence" INTEGER NOT NULL CHECK ("sequence" > 0),
      "version" INTEGER NOT NULL CHECK ("version" > 0),
      "previousId" INTEGER REFERENCES "quote" ("id") ON DELETE SET NULL,
      "supersededById" INTEGER REFERENCES "quote" ("id") ON DELETE SET NULL,
      "status" TEXT NOT NULL CHECK ("status" IN (${statuses})),
      "riderId" INTEGER NOT NULL REFERENCES "user" ("id") ON DELETE CASCADE,
      "bikeId" INTEGER REFERENCES "bike" ("id") ON DELETE SET NULL,
      "sizingRecordId" INTEGER NOT NULL REFERENCES "sizing_record" ("id"),
      "createdById" INTEGER REFERENCES "user" ("id") ON DELETE SET NULL,
      "currency" TEXT NOT NULL CHECK (length("currency") = 3),
      "shop" TEXT NOT NULL CHECK (json_valid("shop")),
      "cautions" TEXT NOT NULL DEFAULT '',
      "labourRateCentsPerHour" INTEGER NOT NULL CHECK ("labourRateCentsPerHour" >= 0),
      "taxBasisPoints" INTEGER NOT NULL CHECK ("taxBasisPoints" >= 0),
      "partsCents" INTEGER NOT NULL CHECK ("partsCents" >= 0),
      "labourCents" INTEGER NOT NULL CHECK ("labourCents" >= 0),
      "subtotalCents" INTEGER NOT NULL CHECK ("subtotalCents" = "partsCents" + "labourCents"),
      "taxCents" INTEGER NOT NULL CHECK ("taxCents" >= 0),
      "totalCents" INTEGER NOT NULL CHECK ("totalCents" = "subtotalCents" + "taxCents"),
      "depositDueCents" INTEGER NOT NULL CHECK ("depositDueCents" BETWEEN 0 AND "totalCents"),
      "paidCents" INTEGER NOT NULL DEFAULT 0 CHECK ("paidCents" >= 0),
      "refundedCents" INTEGER NOT NULL DEFAULT 0 CHECK ("refundedCents" BETWEEN 0 AND "paidCents"),
      "validUntil" DATETIME NOT NULL,
      "tokenHash" TEXT,
      "sentAt" DATETIME,
      "fittingAt" DATETIME,
      "createdAt" DATETIME NOT NULL,
      "updatedAt" DATETIME NOT NULL,
      UNIQUE ("year", "sequence", "version")
    )`);
    await q.query(`CREATE INDEX "idx_quote_status" ON "quote" ("status", "id")`);
    await q.query(`CREATE INDEX "idx_quote_rider" ON "quote" ("riderId", "id")`);
    await q.query(`CREATE UNIQUE INDEX "uq_quote_token" ON "quote" ("tokenHash") WHERE "tokenHash" IS NOT NULL`);

    await q.query(`CREATE TABLE "quote_line" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "quoteId" INTEGER NOT NULL REFERENCES "quote" ("id") ON DELETE CASCADE,
      "position" INTEGER NOT NULL,
      "kind" TEXT NOT NULL CHECK ("kind" IN ('spring', 'labour')),
      "end" TEXT CHECK ("end" IS NULL OR "end" IN ('front', 'rear')),
      "springId" INTEGER REFERENCES "spring_rate" ("id"),
      "sku" TEXT,
      "operationCode" TEXT,
      "description" TEXT NOT NULL,
      "quantity" INTEGER NOT NULL CHECK ("quantity" > 0),
      "minutes" INTEGER CHECK ("minutes" IS NULL OR "minutes" > 0),
      "unitPriceCents" INTEGER NOT NULL CHECK ("unitPriceCents" >= 0),
      "lineCents" INTEGER NOT NULL CHECK ("lineCents" >= 0),
      CHECK (("kind" = 'spring' AND "springId" IS NOT NULL AND "end" IS NOT NULL) OR ("kind" = 'labour' AND "operationCode" IS NOT NULL AND "minutes" IS NOT NULL))
    )`);
    await q.query(`CREATE INDEX "idx_quote_line_quote" ON "quote_line" ("quoteId", "position")`);

    await q.query(`CREATE TABLE "quote_status_event" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "quoteId" INTEGER NOT NULL REFERENCES "quote" ("id") ON DELETE CASCADE,
      "fromStatus" TEXT CHECK ("fromStatus" IS NULL OR "fromStatus" IN (${statuses})),
      "toStatus" TEXT NOT NULL CHECK ("toStatus" IN (${statuses})),
      "actorKind" TEXT NOT NULL CHECK ("actorKind" IN ('staff', 'rider', 'customer-link', 'system', 'payment')),
      "actorId" INTEGER REFERENCES "user" ("id") ON DELETE SET NULL,
      "actorName" TEXT NOT NULL,
      "note" TEXT NOT NULL DEFAULT '',
      "at" DATETIME NOT NULL
    )`);
    await q.query(`CREATE INDEX "idx_quote_status_event_quote" ON "quote_status_event" ("quoteId", "id")`);

    await q.query(`CREATE TABLE "payment" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "quoteId" INTEGER NOT NULL REFERENCES "quote" ("id") ON DELETE CASCADE,
      "kind" TEXT NOT NULL CHECK ("kind" IN ('deposit', 'refund')),
      "providerId" TEXT NOT NULL,
      "amountCents" INTEGER NOT NULL CHECK ("amountCents" > 0),
      "currency" TEXT NOT NULL CHECK (length("currency") = 3),
      "method" TEXT NOT NULL,
      "last4" TEXT,
      "at" DATETIME NOT NULL
    )`);
    await q.query(`CREATE UNIQUE INDEX "uq_payment_intent" ON "payment" ("providerId")`);
    await q.query(`CREATE INDEX "idx_payment_quote" ON "payment" ("quoteId", "id")`);

    await q.query(`CREATE TABLE "payment_webhook_event" (
      "eventId" TEXT PRIMARY KEY NOT NULL,
      "type" TEXT NOT NULL,
      "receivedAt" DATETIME NOT NULL
    )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "payment_webhook_event"`);
    await q.query(`DROP TABLE "payment"`);
    await q.query(`DROP TABLE "quote_status_event"`);
    await q.query(`DROP TABLE "quote_line"`);
    await q.query(`DROP TABLE "quote"`);
    await q.query(`DROP TABLE "shop_settings"`);
  }
}
