import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { authorize } from '../../middleware/authenticate';

export function manufacturersRouter(db: DataSource): Router {
  const router = Router();
  router.get('/', authorize('read', 'Part'), async (_req, res) => {
    const rows: { id: string; name: string; part_count: number }[] = await db.query(
      `SELECT m.id, m.name, count(p.id)::int AS part_count
         FROM manufacturers m LEFT JOIN parts p ON p.manufacturer_id = m.id AND NOT p.archived
        GROUP BY m.id ORDER BY lower(m.name)`,
    );
    res.json({ items: rows.map((r) => ({ id: r.id, name: r.name, partCount: r.part_count })) });
  });
  return router;
}
