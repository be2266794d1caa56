-- CreateEnum
CREATE TYPE "RedesignStatus" AS ENUM ('DRAFT', 'APPROVED');

-- CreateTable
CREATE TABLE "Redesign" (
    "id" TEXT NOT NULL,
    "jobId" TEXT NOT NULL,
    "revision" INTEGER NOT NULL,
    "status" "RedesignStatus" NOT NULL DEFAULT 'DRAFT',
    "request" JSONB NOT NULL,
    "sheetRevision" INTEGER NOT NULL,
    "chosenKey" TEXT,
    "version" INTEGER NOT NULL DEFAULT 1,
    "createdById" TEXT,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMP(3) NOT NULL,
    "approvedById" TEXT,
    "approvedAt" TIMESTAMP(3),
    "approvalNote" TEXT,
    "snapshot" JSONB,

    CONSTRAINT "Redesign_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "WireStock" (
    "id" TEXT NOT NULL,
    "standard" TEXT NOT NULL,
    "size" TEXT NOT NULL,
    "enamelGrade" INTEGER NOT NULL,
    "bareMm" DOUBLE PRECISION NOT NULL,
    "quantityKg" DOUBLE PRECISION,
    "note" TEXT,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMP(3) NOT NULL,

    CONSTRAINT "WireStock_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "ShopSettings" (
    "id" TEXT NOT NULL DEFAULT 'shop',
    "fluxGapRise" DOUBLE PRECISION NOT NULL DEFAULT 0.05,
    "fluxGapFall" DOUBLE PRECISION NOT NULL DEFAULT 0.1,
    "fluxToothRise" DOUBLE PRECISION NOT NULL DEFAULT 0.05,
    "fluxToothFall" DOUBLE PRECISION NOT NULL DEFAULT 0.1,
    "fluxYokeRise" DOUBLE PRECISION NOT NULL DEFAULT 0.05,
    "fluxYokeFall" DOUBLE PRECISION NOT NULL DEFAULT 0.5,
    "currentDensityRise" DOUBLE PRECISION NOT NULL DEFAULT 0.05,
    "currentDensityMaxAPerMm2" DOUBLE PRECISION NOT NULL DEFAULT 6,
    "slotFillMax" DOUBLE PRECISION NOT NULL DEFAULT 0.6,
    "maxStrandsInHand" INTEGER NOT NULL DEFAULT 10,
    "maxWireSizes" INTEGER NOT NULL DEFAULT 3,
    "mixedSizeRatioMax" DOUBLE PRECISION NOT NULL DEFAULT 1.3,
    "version" INTEGER NOT NULL DEFAULT 1,
    "updatedAt" TIMESTAMP(3) NOT NULL,
    "updatedById" TEXT,

    CONSTRAINT "ShopSettings_pkey" PRIMARY KEY ("id")
);

-- CreateIndex
CREATE INDEX "Redesign_jobId_status_idx" ON "Redesign"("jobId", "status");

-- CreateIndex
CREATE UNIQUE INDEX "Redesign_jobId_revision_key" ON "Redesign"("jobId", "revision");

-- CreateIndex
CREATE INDEX "WireStock_bareMm_idx" ON "WireStock"("bareMm");

-- CreateIndex
CREATE UNIQUE INDEX "WireStock_standard_size_enamelGrade_key" ON "WireStock"("standard", "size", "enamelGrade");

-- AddForeignKey
ALTER TABLE "Redesign" ADD CONSTRAINT "Redesign_jobId_fkey" FOREIGN KEY ("jobId") REFERENCES "Job"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Redesign" ADD CONSTRAINT "Redesign_createdById_fkey" FOREIGN KEY ("createdById") REFERENCES "User"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Redesign" ADD CONSTRAINT "Redesign_approvedById_fkey" FOREIGN KEY ("approvedById") REFERENCES "User"("id") ON DELETE RESTRICT ON UPDATE CASCADE;
