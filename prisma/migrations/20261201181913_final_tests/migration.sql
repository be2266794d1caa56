-- CreateEnum
CREATE TYPE "TestVerdict" AS ENUM ('PASS', 'FAIL', 'INCOMPLETE');

-- CreateTable
CREATE TABLE "TestRecord" (
    "id" TEXT NOT NULL,
    "jobId" TEXT NOT NULL,
    "sequence" INTEGER NOT NULL,
    "data" JSONB NOT NULL,
    "verdict" "TestVerdict" NOT NULL,
    "testedAt" TIMESTAMP(3) NOT NULL,
    "testedById" TEXT,
    "instrumentSerials" TEXT[],
    "version" INTEGER NOT NULL DEFAULT 1,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMP(3) NOT NULL,

    CONSTRAINT "TestRecord_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "JobSheetSnapshot" (
    "id" TEXT NOT NULL,
    "jobId" TEXT NOT NULL,
    "pdf" BYTEA NOT NULL,
    "sizeBytes" INTEGER NOT NULL,
    "revision" INTEGER NOT NULL,
    "generatedAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "JobSheetSnapshot_pkey" PRIMARY KEY ("id")
);

-- CreateIndex
CREATE INDEX "TestRecord_testedById_idx" ON "TestRecord"("testedById");

-- CreateIndex
CREATE UNIQUE INDEX "TestRecord_jobId_sequence_key" ON "TestRecord"("jobId", "sequence");

-- CreateIndex
CREATE UNIQUE INDEX "JobSheetSnapshot_jobId_key" ON "JobSheetSnapshot"("jobId");

-- AddForeignKey
ALTER TABLE "TestRecord" ADD CONSTRAINT "TestRecord_jobId_fkey" FOREIGN KEY ("jobId") REFERENCES "Job"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "TestRecord" ADD CONSTRAINT "TestRecord_testedById_fkey" FOREIGN KEY ("testedById") REFERENCES "User"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "JobSheetSnapshot" ADD CONSTRAINT "JobSheetSnapshot_jobId_fkey" FOREIGN KEY ("jobId") REFERENCES "Job"("id") ON DELETE CASCADE ON UPDATE CASCADE;
