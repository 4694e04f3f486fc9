// Bare node:http "hello": the ceiling for any HTTP server on this machine.
import { createServer } from 'node:http';

createServer((_req, res) => {
  res.writeHead(200, { 'content-type': 'text/plain' });
  res.end('hello');
}).listen(Number(process.env.PORT ?? 3200), '127.0.0.1', () => process.send?.('ready'));
