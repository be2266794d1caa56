-- CreateTable
CREATE TABLE "JobSheetIssue" (
    "id" TEXT NOT NULL,
    "jobId" TEXT NOT NULL,
    "issue" INTEGER NOT NULL,
    "contentHash" TEXT NOT NULL,
    "issuedAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "JobSheetIssue_pkey" PRIMARY KEY ("id")
);

-- CreateIndex
CREATE UNIQUE INDEX "JobSheetIssue_jobId_issue_key" ON "JobSheetIssue"("jobId", "issue");
