-- AlterTable
ALTER TABLE "ShopSettings" ADD COLUMN     "leadConvention" TEXT NOT NULL DEFAULT 'iec',
ADD COLUMN     "wireAllowance" DOUBLE PRECISION NOT NULL DEFAULT 0.1;
