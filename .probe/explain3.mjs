import { PGlite } from '@electric-sql/pglite';
const pg = new PGlite('/tmp/cuffwright-queue-bench-mFsSsj/pglite');
const { rows: [s] } = await pg.query(`select m.organization_id as shop from "user" u join member m on m.user_id=u.id where u.email like 'lead-1000-%'`);
const q = `select g.id, g.description, g.status, g.due_on, g.assignee_id, (select name from "user" u where u.id=g.assignee_id), g.ticket_id, (select number from tickets t where t.id=g.ticket_id), (select c.name from tickets t join customers c on c.id=t.customer_id where t.id=g.ticket_id), g.position, g.created_at::text from garments g where g.shop_id=$1 and g.status <> 'collected'`;
const bare = `select g.id from garments g where g.shop_id=$1 and g.status <> 'collected'`;
for (const [name, sql, p] of [['select 1', 'select 1', []], ['bare', bare, [s.shop]], ['q', q, [s.shop]]]) { for (let i = 0; i < 5; i++) await pg.query(sql, p); const t0 = performance.now(); for (let i = 0; i < 50; i++) await pg.query(sql, p); console.log(name, 'ms/query', ((performance.now() - t0) / 50).toFixed(2)); }
const r = await pg.query('explain (analyze, timing off) ' + q, [s.shop]); console.log(r.rows.map((x) => x['QUERY PLAN']).join('\n'));
await pg.close();
