import type { Knex } from "knex";

// Every running-total table, recomputed from what it totals, for one group.
// The rules are the product's (PRODUCT.md computation 4 and the vocabulary):
//  - stage_balances: a stage holds Σ cans moved in − Σ moved out, per drive; broken
//    down per drop point for hauled cans and per heater unit for claimed and built-in cans;
//  - reject_tallies: rejects by reason counted by sorts (null side, per drive and per drop
//    point) plus processing losses (a stage → rejected with a reason, per drive), net of undos;
//  - drop_point_tallies: hauls and bags of the point's hauls not undone, and its counted
//    good and rejected cans;
//  - drive_daily_good: good cans counted per UTC day (an undo counts on the day it undoes);
//  - group_calibration: counted cans, hauls, bags and kg of the sorts not undone.
// A stock count's lines (reason `stockCount`) are adjustments, not counted cans: they move
// stage balances only. Returns one readable line per total that differs (empty when all agree).
export async function totalsMismatches(db: Knex, groupId: string): Promise<string[]> {
  const { rows } = await db.raw(
    `with lines as (
       select l.*, coalesce(o.occurred_at, l.occurred_at) as counted_at
       from ledger_lines l left join ledger_lines o on o.id = l.reverses_id
       where l.group_id = :g
     ), sides as (
       select drive_id, drop_point_id as dp, heater_unit_id as hu, to_stage as stage, quantity::bigint as q from lines where to_stage is not null
       union all
       select drive_id, drop_point_id, heater_unit_id, from_stage, -quantity from lines where from_stage is not null
     ), counted as (
       -- one side outside the ledger: a sort's counted cans or their undo
       select drive_id, drop_point_id as dp, coalesce(from_stage, to_stage) as stage, coalesce(reason, 'other') as reason,
              case when from_stage is null then quantity else -quantity end::bigint as q, (counted_at at time zone 'UTC')::date as day
       from lines where (from_stage is null or to_stage is null) and reason is distinct from 'stockCount'
     ), losses as (
       select drive_id, reason, case when to_stage = 'rejected' then quantity else -quantity end::bigint as q
       from lines where from_stage is not null and to_stage is not null and 'rejected' in (from_stage, to_stage) and reason is not null
     ), checks as (
       select 'stage_balances' as t, concat_ws(' ', coalesce(e.drive_id, a.drive_id), coalesce(e.dp, a.drop_point_id), coalesce(e.hu, a.heater_unit_id), coalesce(e.stage, a.stage)) as k, e.q as want, a.quantity as got
       from (select drive_id, null::uuid as dp, null::uuid as hu, stage, sum(q) as q from sides group by drive_id, stage
             union all select drive_id, dp, null, stage, sum(q) from sides where stage = 'hauled' and dp is not null group by drive_id, dp, stage
             union all select drive_id, null, hu, stage, sum(q) from sides where stage in ('claimed', 'builtIn') and hu is not null group by drive_id, hu, stage) e
       full join (select * from stage_balances where group_id = :g) a
         on a.drive_id = e.drive_id and a.drop_point_id is not distinct from e.dp and a.heater_unit_id is not distinct from e.hu and a.stage = e.stage
       union all
       select 'reject_tallies', concat_ws(' ', coalesce(e.drive_id, a.drive_id), coalesce(e.dp, a.drop_point_id), coalesce(e.reason, a.reason)), e.q, a.quantity
       from (select drive_id, null::uuid as dp, reason, sum(q) as q
             from (select drive_id, reason, q from counted where stage = 'rejected' union all select drive_id, reason, q from losses) r group by drive_id, reason
             union all select drive_id, dp, reason, sum(q) from counted where stage = 'rejected' and dp is not null group by drive_id, dp, reason) e
       full join (select * from reject_tallies where group_id = :g) a
         on a.drive_id = e.drive_id and a.drop_point_id is not distinct from e.dp and a.reason = e.reason
       union all
       select 'drop_point_tallies.' || x.col, p.id::text, x.want, x.got
       from drop_points p left join drop_point_tallies t on t.drop_point_id = p.id
       cross join lateral (values
         ('hauls', (select count(*) from hauls h where h.drop_point_id = p.id and h.reversed_at is null), t.hauls::bigint),
         ('bags', (select coalesce(sum(bags), 0) from hauls h where h.drop_point_id = p.id and h.reversed_at is null), t.bags::bigint),
         ('good_cans', (select coalesce(sum(q), 0) from counted c where c.dp = p.id and c.stage = 'good'), t.good_cans),
         ('rejected_cans', (select coalesce(sum(q), 0) from counted c where c.dp = p.id and c.stage = 'rejected'), t.rejected_cans)) as x(col, want, got)
       where p.group_id = :g
       union all
       select 'drive_daily_good', concat_ws(' ', coalesce(e.drive_id, a.drive_id), coalesce(e.day, a.day)), e.q, a.good_cans
       from (select drive_id, day, sum(q) as q from counted where stage = 'good' group by drive_id, day) e
       full join (select d.* from drive_daily_good d join drives v on v.id = d.drive_id where v.group_id = :g) a on a.drive_id = e.drive_id and a.day = e.day
       union all
       select 'group_calibration.' || x.col, :g::text, x.want, x.got
       from (select
               coalesce(sum(haul_count) filter (where weight_kg > 0), 0) as wh, coalesce(sum(counted) filter (where weight_kg > 0), 0) as wc,
               coalesce(sum(weight_kg) filter (where weight_kg > 0), 0) as wk, coalesce(sum(haul_count) filter (where bags > 0), 0) as bh,
               coalesce(sum(counted) filter (where bags > 0), 0) as bc, coalesce(sum(bags) filter (where bags > 0), 0) as b
             from sorts where group_id = :g and reversed_at is null) s
       left join group_calibration c on c.group_id = :g
       cross join lateral (values ('weight_hauls', s.wh, c.weight_hauls), ('weight_cans', s.wc, c.weight_cans), ('weight_kg', s.wk, c.weight_kg),
                                  ('bag_hauls', s.bh, c.bag_hauls), ('bag_cans', s.bc, c.bag_cans), ('bags', s.b, c.bags)) as x(col, want, got)
     )
     select t, k, coalesce(want, 0)::text as want, coalesce(got, 0)::text as got from checks where coalesce(want, 0) <> coalesce(got, 0) order by t, k`,
    { g: groupId },
  );
  return (rows as { t: string; k: string; want: string; got: string }[]).map((r) => `${r.t} [${r.k}]: lines say ${r.want}, total says ${r.got}`);
}
