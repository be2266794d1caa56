-- The board sorts by customer and filters open jobs through indexes on two copied columns of "Job":
-- "customerName" (the customer's company, kept by the same trigger that builds "searchText", so a renamed
-- customer re-sorts its jobs) and "isOpen" (false once shipped or returned unrepaired, kept from "status").
CREATE OR REPLACE FUNCTION coilwright_job_search_text() RETURNS trigger AS $$
DECLARE
  company text := (SELECT c."company" FROM "Customer" c WHERE c."id" = NEW."customerId");
BEGIN
  NEW."customerName" := coalesce(company, '');
  NEW."searchText" := lower(concat_ws(' ',
    NEW."number"::text,
    company,
    (SELECT concat_ws(' ', m."manufacturer", m."model", m."serial") FROM "Motor" m WHERE m."id" = NEW."motorId"),
    NEW."customerPo"));
  RETURN NEW;
END
$$ LANGUAGE plpgsql;

CREATE OR REPLACE FUNCTION coilwright_job_is_open() RETURNS trigger AS $$
BEGIN
  NEW."isOpen" := NEW."status" NOT IN ('SHIPPED', 'RETURNED_UNREPAIRED');
  RETURN NEW;
END
$$ LANGUAGE plpgsql;

CREATE TRIGGER "Job_isOpen"
  BEFORE INSERT OR UPDATE OF "status" ON "Job"
  FOR EACH ROW EXECUTE FUNCTION coilwright_job_is_open();

-- Jobs that existed before this migration (fires both triggers).
UPDATE "Job" SET "customerId" = "customerId", "status" = "status";
