import { PGlite } from '@electric-sql/pglite';
const pg = new PGlite('/tmp/cuffwright-queue-bench-mFsSsj/pglite');
const { rows: [s] } = await pg.query(`select m.organization_id as shop from "user" u join member m on m.user_id=u.id where u.email like 'lead-1000-%'`);
const q = `select g.id, g.description, g.status, g.due_on, g.assignee_id, u.name, g.ticket_id, t.number, c.name, g.created_at::text from garments g join tickets t on t.id=g.ticket_id left join customers c on c.id=t.customer_id left join "user" u on u.id=g.assignee_id where g.shop_id=$1 and g.status <> 'collected' order by g.due_on, t.number, g.position, g.id`;
for (let i = 0; i < 3; i++) {
  const r = await pg.query('explain analyze ' + q, [s.shop]);
  console.log(r.rows.map((x) => x['QUERY PLAN']).join('\n'));
}
const agg = `select count(*)::text, coalesce(sum(hashtext(g.id::text || coalesce(t.customer_id::text,'') || coalesce(u.id,''))::bigint),0)::text, max(g.updated_at)::text, max(c.updated_at)::text, max(u.updated_at)::text from garments g join tickets t on t.id=g.ticket_id left join customers c on c.id=t.customer_id left join "user" u on u.id=g.assignee_id where g.shop_id=$1 and g.status <> 'collected'`;
const r = await pg.query('explain analyze ' + agg, [s.shop]);
console.log(r.rows.map((x) => x['QUERY PLAN']).join('\n'));
for (const sql of [q, agg]) { const t0 = performance.now(); for (let i = 0; i < 50; i++) await pg.query(sql, [s.shop]); console.log('js-side ms/query', ((performance.now() - t0) / 50).toFixed(2)); }
await pg.close();
