import { createServer } from 'node:http';
import Database from 'better-sqlite3';
import { BaselineBoard } from './baseline-board.js';

/**
 * The fastest this stack can answer the board: node:http and better-sqlite3 with the board's own
 * row builder. It does not sign anyone in, check a token or a role, validate beyond the ward id,
 * log, set security headers, compute an ETag or go through Nest, Express or TypeORM.
 * `node baseline-server.js <database file>`, port from PORT.
 */
const [file] = process.argv.slice(2);
const db = new Database(file);
db.pragma('journal_mode = WAL');
const boards = new BaselineBoard(db);

const server = createServer((req, res) => {
  const match = /^\/api\/wards\/(\d+)\/handover$/.exec(req.url ?? '');
  if (req.method === 'GET' && match) {
    const board = boards.board(Number(match[1]));
    const body = board ? JSON.stringify(board) : JSON.stringify({ statusCode: 404, message: 'No such ward' });
    res
      .writeHead(board ? 200 : 404, { 'Content-Type': 'application/json; charset=utf-8', 'Content-Length': Buffer.byteLength(body) })
      .end(body);
  } else if (req.url === '/api/health') {
    res.writeHead(200, { 'Content-Type': 'application/json' }).end('{"status":"ok"}');
  } else {
    res.writeHead(404).end();
  }
});
server.listen(Number(process.env.PORT ?? 3100), '127.0.0.1');
process.on('SIGTERM', () => server.close(() => db.close()));
