-- CreateEnum
CREATE TYPE "QuoteStatus" AS ENUM ('DRAFT', 'SENT', 'ACCEPTED', 'DECLINED');

-- CreateEnum
CREATE TYPE "QuoteLineKind" AS ENUM ('LABOUR', 'MATERIAL', 'PART', 'SERVICE', 'REWIND');

-- CreateTable
CREATE TABLE "CommercialSettings" (
    "id" TEXT NOT NULL DEFAULT 'shop',
    "currency" TEXT NOT NULL DEFAULT 'USD',
    "taxMode" TEXT NOT NULL DEFAULT 'ON_TOTAL',
    "defaultTaxRateBp" INTEGER NOT NULL DEFAULT 0,
    "labourRateMinor" INTEGER NOT NULL DEFAULT 0,
    "copperPricePerKgMinor" INTEGER NOT NULL DEFAULT 0,
    "copperAllowanceBp" INTEGER NOT NULL DEFAULT 1000,
    "insulationAllowanceBp" INTEGER NOT NULL DEFAULT 0,
    "varnishAllowanceBp" INTEGER NOT NULL DEFAULT 0,
    "quoteValidityDays" INTEGER NOT NULL DEFAULT 30,
    "quoteTerms" TEXT NOT NULL DEFAULT '',
    "warrantyDays" INTEGER NOT NULL DEFAULT 365,
    "version" INTEGER NOT NULL DEFAULT 1,
    "updatedAt" TIMESTAMP(3) NOT NULL,
    "updatedById" TEXT,

    CONSTRAINT "CommercialSettings_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "Quote" (
    "id" TEXT NOT NULL,
    "jobId" TEXT NOT NULL,
    "revision" INTEGER NOT NULL,
    "status" "QuoteStatus" NOT NULL DEFAULT 'DRAFT',
    "currency" TEXT NOT NULL,
    "taxMode" TEXT NOT NULL,
    "discountBp" INTEGER NOT NULL DEFAULT 0,
    "notes" TEXT,
    "version" INTEGER NOT NULL DEFAULT 1,
    "subtotalMinor" BIGINT NOT NULL DEFAULT 0,
    "discountMinor" BIGINT NOT NULL DEFAULT 0,
    "taxMinor" BIGINT NOT NULL DEFAULT 0,
    "totalMinor" BIGINT NOT NULL DEFAULT 0,
    "terms" TEXT,
    "validUntil" DATE,
    "sentAt" TIMESTAMP(3),
    "sentById" TEXT,
    "decidedAt" TIMESTAMP(3),
    "decidedBy" TEXT,
    "decisionMethod" TEXT,
    "customerOrderNumber" TEXT,
    "decisionNote" TEXT,
    "decisionRecordedById" TEXT,
    "createdById" TEXT,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMP(3) NOT NULL,

    CONSTRAINT "Quote_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "QuoteLine" (
    "id" TEXT NOT NULL,
    "quoteId" TEXT NOT NULL,
    "position" INTEGER NOT NULL,
    "kind" "QuoteLineKind" NOT NULL,
    "description" TEXT NOT NULL,
    "reference" TEXT,
    "quantityMilli" INTEGER NOT NULL,
    "unit" TEXT NOT NULL,
    "unitPriceMinor" INTEGER NOT NULL,
    "taxRateBp" INTEGER NOT NULL,

    CONSTRAINT "QuoteLine_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "LabourBooking" (
    "id" TEXT NOT NULL,
    "jobId" TEXT NOT NULL,
    "personId" TEXT,
    "personName" TEXT NOT NULL,
    "task" TEXT NOT NULL,
    "hoursMilli" INTEGER NOT NULL,
    "workedOn" DATE NOT NULL,
    "bookedById" TEXT,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "LabourBooking_pkey" PRIMARY KEY ("id")
);

-- CreateIndex
CREATE INDEX "Quote_status_sentAt_idx" ON "Quote"("status", "sentAt");

-- CreateIndex
CREATE UNIQUE INDEX "Quote_jobId_revision_key" ON "Quote"("jobId", "revision");

-- CreateIndex
CREATE UNIQUE INDEX "QuoteLine_quoteId_position_key" ON "QuoteLine"("quoteId", "position");

-- CreateIndex
CREATE INDEX "LabourBooking_jobId_idx" ON "LabourBooking"("jobId");

-- CreateIndex
CREATE INDEX "LabourBooking_personId_workedOn_idx" ON "LabourBooking"("personId", "workedOn");

-- AddForeignKey
ALTER TABLE "Quote" ADD CONSTRAINT "Quote_jobId_fkey" FOREIGN KEY ("jobId") REFERENCES "Job"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "QuoteLine" ADD CONSTRAINT "QuoteLine_quoteId_fkey" FOREIGN KEY ("quoteId") REFERENCES "Quote"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "LabourBooking" ADD CONSTRAINT "LabourBooking_jobId_fkey" FOREIGN KEY ("jobId") REFERENCES "Job"("id") ON DELETE RESTRICT ON UPDATE CASCADE;
