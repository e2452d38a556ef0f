-- A ticket's assignee was never set, so an apprentice's ticket filter never applied: each ticket
-- now stands under the person its first garment given to someone is given to (services/garments.ts
-- refreshTicketAssignee keeps it so from here on).
UPDATE "tickets" SET "assignee_id" = (
  SELECT "garments"."assignee_id" FROM "garments"
  WHERE "garments"."ticket_id" = "tickets"."id" AND "garments"."assignee_id" IS NOT NULL
  ORDER BY "garments"."position", "garments"."created_at"
  LIMIT 1
);
