import type { FastifyInstance } from 'fastify';
import type pg from 'pg';

/**
 * The bare baseline of the product's two hot reads: the same tables, one plain query per request,
 * no framework, no session, no mapping beyond what pg returns. The bench compares the product's
 * GET /api/machines and GET /api/machines/:id/readiness with these.
 */

// The machines list: each machine with its target set's name and its readiness summary.
const MACHINES_SQL = `
  select m.id, m.name, m.kind, m.state, m.work_area_x_mm, m.work_area_y_mm, m.notes, m.last_activity_at,
         t.id as target_set_id, t.name as target_set_name,
         r.total, r.within, r.outside, r.waived, r.not_started, r.first_blocking
  from machines m
  join target_sets t on t.id = m.target_set_id
  left join machine_readiness r on r.machine_id = m.id
  where m.workshop_id = $1
  order by m.last_activity_at desc`;

// The readiness board's data in one statement: the newest record of every check (summary
// columns only), the partner rails' newest sweep per datum, the target set and the waivers.
const READINESS_SQL = `
  with m as (select * from machines where id = $2 and workshop_id = $1),
  rl as (select r.* from rails r join m on r.machine_id = m.id),
  ax as (select a.* from axes a join m on a.machine_id = m.id),
  checks as (
    select 'rail-straightness' as kind, rl.id as subject_id, s.id as record_id, s.taken_at as recorded_at,
           jsonb_build_object('ls', s.result #> '{leastSquares,straightness}', 'mz', s.result #> '{minimumZone,straightness}', 'status', s.status, 'stations', jsonb_array_length(s.positions_mm)) as figures
    from rl left join lateral (select * from rail_sweeps x where x.rail_id = rl.id order by x.taken_at desc, x.created_at desc limit 1) s on true
    union all
    select 'rail-datum', rl.id, s.id, s.taken_at, jsonb_build_object('datum', s.datum, 'positions', s.positions_mm, 'readings', s.readings_mm)
    from rl join lateral (
      select distinct on (lower(x.datum)) x.* from rail_sweeps x
      where x.rail_id = rl.id and x.datum is not null and rl.partner_rail_id is not null
      order by lower(x.datum), x.taken_at desc, x.created_at desc
    ) s on true
    union all
    select 'travel-trial', ax.id, t.id, t.created_at, jsonb_build_object('errorPercent', t.result -> 'errorPercent', 'corrected', t.result -> 'correctedStepsPerMm')
    from ax left join lateral (select * from travel_trials x where x.workshop_id = $1 and x.axis_id = ax.id order by x.created_at desc limit 1) t on true
    union all
    select 'positioning', ax.id, p.id, p.created_at, jsonb_build_object('accuracy', p.result -> 'accuracyMm', 'repeatability', p.result -> 'repeatabilityMm', 'reversal', p.result -> 'reversalMm')
    from ax left join lateral (select * from positioning_runs x where x.workshop_id = $1 and x.axis_id = ax.id order by x.created_at desc limit 1) p on true
    union all
    select 'diagonal-check', m.id, d.id, d.recorded_at, to_jsonb(d) - 'workshop_id' from m left join lateral (select * from diagonal_checks x where x.workshop_id = $1 and x.machine_id = m.id order by x.recorded_at desc limit 1) d on true
    union all
    select 'bed-grid', m.id, g.id, g.recorded_at, to_jsonb(g) - 'workshop_id' from m left join lateral (select * from bed_grids x where x.workshop_id = $1 and x.machine_id = m.id order by x.recorded_at desc limit 1) g on true
    union all
    select 'test-cut', m.id, c.id, c.recorded_at, to_jsonb(c) - 'workshop_id' from m left join lateral (select * from test_cuts x where x.workshop_id = $1 and x.machine_id = m.id order by x.recorded_at desc limit 1) c on true
    union all
    select 'safety-walk', m.id, w.id, w.started_at, (select jsonb_agg(jsonb_build_object('item', a.item_key, 'answer', a.answer)) from safety_answers a where a.walk_id = w.id)
    from m left join lateral (select * from safety_walks x where x.workshop_id = $1 and x.machine_id = m.id order by x.started_at desc limit 1) w on true
  )
  select (select to_jsonb(m) from m) as machine,
         (select jsonb_build_object('id', t.id, 'name', t.name, 'targets', t.targets) from target_sets t join m on t.id = m.target_set_id) as target_set,
         (select coalesce(jsonb_agg(to_jsonb(c)), '[]') from checks c) as checks,
         (select coalesce(jsonb_agg(jsonb_build_object('checkKey', w.check_key, 'recordId', w.record_id, 'reason', w.reason) order by w.waived_at desc), '[]')
            from waivers w join m on w.machine_id = m.id) as waivers,
         (select coalesce(jsonb_agg(jsonb_build_object('id', i.id, 'section', i.section)), '[]') from safety_items i where i.workshop_id = $1 and i.active) as safety_items`;

/** Adds the two bare read routes; the workshop comes in the query string (the bare server has no sessions). */
export function registerBareReads(fastify: FastifyInstance, pool: pg.Pool): void {
  fastify.get<{ Querystring: { workshopId?: string } }>('/machines', async (req) => {
    const { rows } = await pool.query(MACHINES_SQL, [req.query.workshopId]);
    return rows;
  });
  fastify.get<{ Params: { id: string }; Querystring: { workshopId?: string } }>(
    '/machines/:id/readiness',
    async (req, reply) => {
      const { rows } = await pool.query(READINESS_SQL, [req.query.workshopId, req.params.id]);
      if (!rows[0]?.machine) return reply.code(404).send({ message: 'No such machine' });
      return rows[0];
    },
  );
}
