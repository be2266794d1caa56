-- AlterTable
ALTER TABLE "Redesign" ADD COLUMN     "search" JSONB,
ADD COLUMN     "searchedAt" TIMESTAMP(3);

-- AlterTable
ALTER TABLE "ShopSettings" ADD COLUMN     "harmonicKwMax" DOUBLE PRECISION NOT NULL DEFAULT 0.26,
ADD COLUMN     "minWireBareMm" DOUBLE PRECISION NOT NULL DEFAULT 0.5;

-- CreateTable
CREATE TABLE "WireReservation" (
    "id" TEXT NOT NULL,
    "redesignId" TEXT NOT NULL,
    "stockId" TEXT NOT NULL,
    "kg" DOUBLE PRECISION NOT NULL,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "releasedAt" TIMESTAMP(3),

    CONSTRAINT "WireReservation_pkey" PRIMARY KEY ("id")
);

-- CreateIndex
CREATE INDEX "WireReservation_stockId_releasedAt_idx" ON "WireReservation"("stockId", "releasedAt");

-- CreateIndex
CREATE INDEX "WireReservation_redesignId_idx" ON "WireReservation"("redesignId");

-- AddForeignKey
ALTER TABLE "WireReservation" ADD CONSTRAINT "WireReservation_redesignId_fkey" FOREIGN KEY ("redesignId") REFERENCES "Redesign"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "WireReservation" ADD CONSTRAINT "WireReservation_stockId_fkey" FOREIGN KEY ("stockId") REFERENCES "WireStock"("id") ON DELETE CASCADE ON UPDATE CASCADE;
