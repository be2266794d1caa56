-- Keeps "Job"."searchText" (job number, customer, motor make/model/serial, customer PO, lower case) in step
-- with the rows it is made from, whichever program writes them. The board searches it through the trigram
-- index created in the previous migration.
CREATE OR REPLACE FUNCTION coilwright_job_search_text() RETURNS trigger AS $$
BEGIN
  NEW."searchText" := lower(concat_ws(' ',
    NEW."number"::text,
    (SELECT c."company" FROM "Customer" c WHERE c."id" = NEW."customerId"),
    (SELECT concat_ws(' ', m."manufacturer", m."model", m."serial") FROM "Motor" m WHERE m."id" = NEW."motorId"),
    NEW."customerPo"));
  RETURN NEW;
END
$$ LANGUAGE plpgsql;

CREATE TRIGGER "Job_searchText"
  BEFORE INSERT OR UPDATE OF "number", "customerId", "motorId", "customerPo" ON "Job"
  FOR EACH ROW EXECUTE FUNCTION coilwright_job_search_text();

-- A renamed customer or a corrected serial re-indexes that customer's or motor's jobs.
CREATE OR REPLACE FUNCTION coilwright_touch_jobs_of_customer() RETURNS trigger AS $$
BEGIN
  IF NEW."company" IS DISTINCT FROM OLD."company" THEN
    UPDATE "Job" SET "customerId" = "customerId" WHERE "customerId" = NEW."id";
  END IF;
  RETURN NULL;
END
$$ LANGUAGE plpgsql;

CREATE TRIGGER "Customer_searchText"
  AFTER UPDATE OF "company" ON "Customer"
  FOR EACH ROW EXECUTE FUNCTION coilwright_touch_jobs_of_customer();

CREATE OR REPLACE FUNCTION coilwright_touch_jobs_of_motor() RETURNS trigger AS $$
BEGIN
  IF (NEW."manufacturer", NEW."model", NEW."serial") IS DISTINCT FROM (OLD."manufacturer", OLD."model", OLD."serial") THEN
    UPDATE "Job" SET "motorId" = "motorId" WHERE "motorId" = NEW."id";
  END IF;
  RETURN NULL;
END
$$ LANGUAGE plpgsql;

CREATE TRIGGER "Motor_searchText"
  AFTER UPDATE OF "manufacturer", "model", "serial" ON "Motor"
  FOR EACH ROW EXECUTE FUNCTION coilwright_touch_jobs_of_motor();

-- Jobs that existed before this migration.
UPDATE "Job" SET "customerId" = "customerId";
