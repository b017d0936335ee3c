import net from 'node:net';

export interface HangingSmtp {
  /** connections it has taken so far */
  readonly accepted: number;
  close(): void;
}

/** A mail server that accepts each TCP connection and then says nothing, ever (loopback only). */
export function startHangingSmtp(port: number): Promise<HangingSmtp> {
  const sockets = new Set<net.Socket>();
  let accepted = 0;
  const server = net.createServer((socket) => {
    accepted++;
    sockets.add(socket);
    socket.on('error', () => undefined);
    socket.on('close', () => sockets.delete(socket));
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () =>
      resolve({
        get accepted() {
          return accepted;
        },
        close() {
          for (const socket of sockets) socket.destroy();
          server.close();
        },
      }),
    );
  });
}
