import "server-only";
/**
 * The board in ONE statement, whatever the number of trails: the park (found by slug, its
 * park-local "today" computed from $2 in its own time zone), the park-wide state in force,
 * every trail with today's and yesterday's current report, the latest report on or before
 * today, and open hazards aggregated per trail with their photo ids.
 * Indexes used: parks.slug (unique), trails (park_id, archived_at, name),
 * trail_reports_one_current (trail_id, report_date) WHERE is_current, hazards (park_id,
 * resolved_at), photos (hazard_id), park_states (park_id, cleared_at).
 * Parameters: $1 park slug, $2 the instant "now" (timestamptz). Kept free of any import so
 * the benchmark's bare server runs exactly this text.
 */
export const BOARD_SQL = `
WITH p AS (
  SELECT id, slug, name, time_zone, fictional, ($2::timestamptz AT TIME ZONE time_zone)::date AS today
  FROM parks WHERE slug = $1
),
open_hazards AS (
  SELECT h.trail_id,
         json_agg(json_build_object(
           'id', h.id, 'trailId', h.trail_id, 'kind', h.kind, 'note', h.note, 'lon', h.lon, 'lat', h.lat,
           'reportedAt', h.reported_at,
           'photoIds', COALESCE((SELECT json_agg(ph.id ORDER BY ph.created_at, ph.id) FROM photos ph WHERE ph.hazard_id = h.id), '[]'::json)
         ) ORDER BY h.reported_at, h.id) AS hazards
  FROM hazards h JOIN p ON h.park_id = p.id
  WHERE h.resolved_at IS NULL
  GROUP BY h.trail_id
),
active_state AS (
  SELECT json_build_object('id', s.id, 'state', s.state, 'message', s.message, 'startsAt', s.starts_at, 'endsAt', s.ends_at) AS park_state
  FROM park_states s JOIN p ON s.park_id = p.id
  WHERE s.cleared_at IS NULL AND s.starts_at <= $2::timestamptz AND (s.ends_at IS NULL OR s.ends_at > $2::timestamptz)
  ORDER BY s.starts_at DESC
  LIMIT 1
)
SELECT p.slug, p.name AS park_name, p.time_zone, p.fictional, to_char(p.today, 'YYYY-MM-DD') AS today,
       (SELECT park_state FROM active_state) AS park_state,
       (SELECT hazards FROM open_hazards WHERE trail_id IS NULL) AS park_hazards,
       t.id AS trail_id, t.name AS trail_name, t.difficulty, t.kind,
       r.revision, r.status, r.reason, r.surfaces, r.features, r.note,
       last.reported_at AS last_report_at,
       y.status AS yesterday_status, y.surfaces AS yesterday_surfaces,
       oh.hazards
FROM p
LEFT JOIN trails t ON t.park_id = p.id AND t.archived_at IS NULL
LEFT JOIN trail_reports r ON r.trail_id = t.id AND r.report_date = p.today AND r.is_current
LEFT JOIN trail_reports y ON y.trail_id = t.id AND y.report_date = p.today - 1 AND y.is_current
LEFT JOIN LATERAL (
  SELECT lr.reported_at FROM trail_reports lr
  WHERE lr.trail_id = t.id AND lr.is_current AND lr.report_date <= p.today
  ORDER BY lr.report_date DESC LIMIT 1
) last ON true
LEFT JOIN open_hazards oh ON oh.trail_id = t.id
ORDER BY t.name, t.id`;
