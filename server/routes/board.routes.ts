import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { writeBoardCsv } from '@/server/lib/board-csv';
import { auth, currentUser, requirePermission } from '@/server/middleware/auth';
import { checkedQuery, validate } from '@/server/middleware/validate';
import { boardRowsForExport, getBoard } from '@/server/services/board.service';
import { BOARD_CSV_MAX_ROWS } from '@/shared/rules/board';
import { readPaging } from '@/shared/rules/paging';
import { localDate } from '@/shared/rules/time-zone';
import { boardQuery, type BoardQueryInput } from '@/shared/schemas/queries';

/**
 * GET /api/board      live tags across the caller's sites, filtered, sorted and paged, with counts (BoardResponse)
 * GET /api/board.csv  the same view as CSV, every page up to BOARD_CSV_MAX_ROWS rows
 * Supervisors and admins see every site, viewers the sites given to them; engineers are refused (403).
 */
export function boardRoutes({ sequelize, config }: AppContext) {
  const router = Router();
  router.use(['/board', '/board.csv'], auth(config.jwtSecret), requirePermission('viewBoard'), validate({ query: boardQuery }));
  router.get('/board', async (req, res) => {
    res.set('Cache-Control', 'no-store').json(await getBoard(sequelize, currentUser(req), checkedQuery<BoardQueryInput>(req), readPaging(req.query)));
  });
  router.get('/board.csv', async (req, res) => {
    const { rows, truncated } = await boardRowsForExport(sequelize, currentUser(req), checkedQuery<BoardQueryInput>(req), BOARD_CSV_MAX_ROWS);
    res.set('Content-Disposition', `attachment; filename="isoledger-board-${localDate(new Date(), 'UTC')}.csv"`);
    res.set('X-Board-Truncated', truncated ? 'true' : 'false');
    res.type('text/csv; charset=utf-8').send(writeBoardCsv(rows, config.publicUrl));
  });
  return router;
}
