-- CreateTable
CREATE TABLE "WindingSheetRevision" (
    "id" TEXT NOT NULL,
    "sheetId" TEXT NOT NULL,
    "revision" INTEGER NOT NULL,
    "data" JSONB NOT NULL,
    "savedAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "savedById" TEXT,

    CONSTRAINT "WindingSheetRevision_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "SheetDraft" (
    "jobId" TEXT NOT NULL,
    "userId" TEXT NOT NULL,
    "data" JSONB NOT NULL,
    "updatedAt" TIMESTAMP(3) NOT NULL,

    CONSTRAINT "SheetDraft_pkey" PRIMARY KEY ("jobId","userId")
);

-- CreateTable
CREATE TABLE "UserPreference" (
    "userId" TEXT NOT NULL,
    "lengthUnit" TEXT NOT NULL DEFAULT 'mm',
    "updatedAt" TIMESTAMP(3) NOT NULL,

    CONSTRAINT "UserPreference_pkey" PRIMARY KEY ("userId")
);

-- CreateIndex
CREATE UNIQUE INDEX "WindingSheetRevision_sheetId_revision_key" ON "WindingSheetRevision"("sheetId", "revision");

-- CreateIndex
CREATE INDEX "SheetDraft_userId_idx" ON "SheetDraft"("userId");

-- AddForeignKey
ALTER TABLE "WindingSheetRevision" ADD CONSTRAINT "WindingSheetRevision_sheetId_fkey" FOREIGN KEY ("sheetId") REFERENCES "WindingSheet"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "SheetDraft" ADD CONSTRAINT "SheetDraft_jobId_fkey" FOREIGN KEY ("jobId") REFERENCES "Job"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "SheetDraft" ADD CONSTRAINT "SheetDraft_userId_fkey" FOREIGN KEY ("userId") REFERENCES "User"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "UserPreference" ADD CONSTRAINT "UserPreference_userId_fkey" FOREIGN KEY ("userId") REFERENCES "User"("id") ON DELETE CASCADE ON UPDATE CASCADE;
