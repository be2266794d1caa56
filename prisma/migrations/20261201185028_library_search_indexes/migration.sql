-- CreateIndex
CREATE INDEX "WindingSheet_lineVoltageV_outputKw_idx" ON "WindingSheet"("lineVoltageV", "outputKw");

-- CreateIndex
CREATE INDEX "WindingSheet_updatedAt_idx" ON "WindingSheet"("updatedAt");
