import { once } from 'node:events';
import http from 'node:http';
import type { RequestListener } from 'node:http';

/**
 * An HTTP server that shuts down gracefully: it stops accepting connections, lets requests
 * in flight finish, closes idle keep-alive connections, and cuts the rest after a grace period.
 */
export async function listen(handler: RequestListener, port: number, host: string) {
  const server = http.createServer(handler);
  server.keepAliveTimeout = 65_000;
  server.listen(port, host);
  await once(server, 'listening');
  const address = server.address();
  const boundPort = typeof address === 'object' && address ? address.port : port;

  let closing: Promise<void> | undefined;
  function shutdown(graceMs = 10_000): Promise<void> {
    closing ??= new Promise<void>((resolve) => {
      // Keep-alive connections turn idle as their last response goes out: close them as they do.
      const sweep = setInterval(() => server.closeIdleConnections(), 100);
      const force = setTimeout(() => server.closeAllConnections(), graceMs);
      server.close(() => {
        clearInterval(sweep);
        clearTimeout(force);
        resolve();
      });
      server.closeIdleConnections();
    });
    return closing;
  }

  return { server, port: boundPort, shutdown };
}
