import { PGlite } from '@electric-sql/pglite';
const pg = new PGlite('/tmp/cuffwright-queue-bench-mFsSsj/pglite');
for (const like of ['lead-1000-%', 'lead-10000-%']) {
const { rows: [s] } = await pg.query(`select m.organization_id as shop from "user" u join member m on m.user_id=u.id where u.email like '${like}'`);
const q = `select g.id, g.description, g.status, g.due_on, g.assignee_id, (select name from "user" u where u.id=g.assignee_id), g.ticket_id, (select number from tickets t where t.id=g.ticket_id), (select c.name from tickets t join customers c on c.id=t.customer_id where t.id=g.ticket_id), g.position, g.created_at::text from garments g where g.shop_id=$1 and g.status <> 'collected'`;
const agg = `select count(*)::text, coalesce(sum(hashtext(g.id::text || coalesce((select customer_id from tickets t where t.id=g.ticket_id)::text,'') || coalesce(g.assignee_id,''))::bigint),0)::text, max(g.updated_at)::text, max((select c.updated_at from tickets t join customers c on c.id=t.customer_id where t.id=g.ticket_id))::text, max((select updated_at from "user" u where u.id=g.assignee_id))::text from garments g where g.shop_id=$1 and g.status <> 'collected'`;
const hist = q.replace("<> 'collected'", "= 'collected'") + ` order by g.created_at desc nulls last, g.id desc nulls last limit 51`;
for (const sql of [q, agg, hist]) { for (let i = 0; i < 5; i++) await pg.query(sql, [s.shop]); const t0 = performance.now(); for (let i = 0; i < 50; i++) await pg.query(sql, [s.shop]); console.log(like, 'ms/query', ((performance.now() - t0) / 50).toFixed(2)); }
const r = await pg.query('explain ' + hist, [s.shop]); console.log(r.rows.map((x) => x['QUERY PLAN']).join('\n'));
}
await pg.close();
