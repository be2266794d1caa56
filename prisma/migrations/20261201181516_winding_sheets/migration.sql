-- CreateTable
CREATE TABLE "WindingSheet" (
    "id" TEXT NOT NULL,
    "jobId" TEXT NOT NULL,
    "data" JSONB NOT NULL,
    "revision" INTEGER NOT NULL DEFAULT 1,
    "slots" INTEGER NOT NULL,
    "poles" INTEGER NOT NULL,
    "boreMm" DOUBLE PRECISION NOT NULL,
    "coreLengthMm" DOUBLE PRECISION NOT NULL,
    "lineVoltageV" DOUBLE PRECISION NOT NULL,
    "frequencyHz" DOUBLE PRECISION NOT NULL,
    "outputKw" DOUBLE PRECISION,
    "manufacturer" TEXT,
    "model" TEXT,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMP(3) NOT NULL,
    "updatedById" TEXT,

    CONSTRAINT "WindingSheet_pkey" PRIMARY KEY ("id")
);

-- CreateIndex
CREATE UNIQUE INDEX "WindingSheet_jobId_key" ON "WindingSheet"("jobId");

-- CreateIndex
CREATE INDEX "WindingSheet_slots_poles_boreMm_idx" ON "WindingSheet"("slots", "poles", "boreMm");

-- CreateIndex
CREATE INDEX "WindingSheet_boreMm_coreLengthMm_idx" ON "WindingSheet"("boreMm", "coreLengthMm");

-- CreateIndex
CREATE INDEX "WindingSheet_manufacturer_model_idx" ON "WindingSheet"("manufacturer", "model");

-- AddForeignKey
ALTER TABLE "WindingSheet" ADD CONSTRAINT "WindingSheet_jobId_fkey" FOREIGN KEY ("jobId") REFERENCES "Job"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "WindingSheet" ADD CONSTRAINT "WindingSheet_updatedById_fkey" FOREIGN KEY ("updatedById") REFERENCES "User"("id") ON DELETE SET NULL ON UPDATE CASCADE;
