-- CreateEnum
CREATE TYPE "CoreTestStage" AS ENUM ('BEFORE_STRIPPING', 'AFTER_STRIPPING', 'AFTER_REPAIRS');

-- CreateTable
CREATE TABLE "CoreLossTest" (
    "id" TEXT NOT NULL,
    "jobId" TEXT NOT NULL,
    "stage" "CoreTestStage" NOT NULL,
    "data" JSONB NOT NULL,
    "testedAt" TIMESTAMP(3) NOT NULL,
    "testedById" TEXT,
    "version" INTEGER NOT NULL DEFAULT 1,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMP(3) NOT NULL,

    CONSTRAINT "CoreLossTest_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "CoreLossSettings" (
    "id" TEXT NOT NULL DEFAULT 'shop',
    "testFluxDensityT" DOUBLE PRECISION NOT NULL DEFAULT 1.3,
    "fieldStrengthAPerM" DOUBLE PRECISION NOT NULL DEFAULT 300,
    "coreLossRiseLimit" DOUBLE PRECISION NOT NULL DEFAULT 0.2,
    "hotSpotRiseLimitK" DOUBLE PRECISION NOT NULL DEFAULT 10,
    "copperLossRiseLimit" DOUBLE PRECISION NOT NULL DEFAULT 0.05,
    "version" INTEGER NOT NULL DEFAULT 1,
    "updatedAt" TIMESTAMP(3) NOT NULL,
    "updatedById" TEXT,

    CONSTRAINT "CoreLossSettings_pkey" PRIMARY KEY ("id")
);

-- CreateIndex
CREATE INDEX "CoreLossTest_jobId_stage_testedAt_idx" ON "CoreLossTest"("jobId", "stage", "testedAt");

-- CreateIndex
CREATE INDEX "CoreLossTest_testedById_idx" ON "CoreLossTest"("testedById");

-- AddForeignKey
ALTER TABLE "CoreLossTest" ADD CONSTRAINT "CoreLossTest_jobId_fkey" FOREIGN KEY ("jobId") REFERENCES "Job"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "CoreLossTest" ADD CONSTRAINT "CoreLossTest_testedById_fkey" FOREIGN KEY ("testedById") REFERENCES "User"("id") ON DELETE SET NULL ON UPDATE CASCADE;
