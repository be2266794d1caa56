-- DropIndex
DROP INDEX "Job_customerId_idx";

-- DropIndex
DROP INDEX "Job_promisedAt_idx";

-- DropIndex
DROP INDEX "Job_receivedAt_idx";

-- DropIndex
DROP INDEX "Job_status_promisedAt_idx";

-- AlterTable
ALTER TABLE "Job" ADD COLUMN     "customerName" TEXT NOT NULL DEFAULT '',
ADD COLUMN     "isOpen" BOOLEAN NOT NULL DEFAULT true;

-- CreateTable
CREATE TABLE "ShopDisplaySettings" (
    "id" TEXT NOT NULL DEFAULT 'shop',
    "timeZone" TEXT,
    "dateFormat" TEXT NOT NULL DEFAULT 'iso',
    "version" INTEGER NOT NULL DEFAULT 1,
    "updatedAt" TIMESTAMP(3) NOT NULL,
    "updatedById" TEXT,

    CONSTRAINT "ShopDisplaySettings_pkey" PRIMARY KEY ("id")
);

-- CreateIndex
CREATE INDEX "Job_isOpen_promisedAt_number_idx" ON "Job"("isOpen", "promisedAt", "number");

-- CreateIndex
CREATE INDEX "Job_isOpen_receivedAt_number_idx" ON "Job"("isOpen", "receivedAt", "number");

-- CreateIndex
CREATE INDEX "Job_isOpen_customerName_number_idx" ON "Job"("isOpen", "customerName", "number");

-- CreateIndex
CREATE INDEX "Job_isOpen_status_number_idx" ON "Job"("isOpen", "status", "number");

-- CreateIndex
CREATE INDEX "Job_isOpen_priority_number_idx" ON "Job"("isOpen", "priority", "number");

-- CreateIndex
CREATE INDEX "Job_isOpen_number_idx" ON "Job"("isOpen", "number");

-- CreateIndex
CREATE INDEX "Job_status_promisedAt_number_idx" ON "Job"("status", "promisedAt", "number");

-- CreateIndex
CREATE INDEX "Job_promisedAt_number_idx" ON "Job"("promisedAt", "number");

-- CreateIndex
CREATE INDEX "Job_receivedAt_number_idx" ON "Job"("receivedAt", "number");

-- CreateIndex
CREATE INDEX "Job_customerName_number_idx" ON "Job"("customerName", "number");

-- CreateIndex
CREATE INDEX "Job_customerId_number_idx" ON "Job"("customerId", "number");

-- CreateIndex
CREATE INDEX "WindingSheet_manufacturer_trgm_idx" ON "WindingSheet" USING GIN ("manufacturer" gin_trgm_ops);

-- CreateIndex
CREATE INDEX "WindingSheet_model_trgm_idx" ON "WindingSheet" USING GIN ("model" gin_trgm_ops);
