import net from 'node:net';

/**
 * A mail server that accepts TCP connections and never says a word (no greeting): what a hung
 * SMTP server looks like to a client. Counts connections and lets a test wait for the next one.
 */
export interface HangingSmtp {
  url: string;
  /** connections accepted so far */
  connections: () => number;
  /** resolves when the next connection arrives */
  nextConnection: () => Promise<void>;
  /** closes every open connection (the client sees the server hang up) */
  dropAll: () => void;
  close: () => Promise<void>;
}

export async function startHangingSmtp(): Promise<HangingSmtp> {
  const sockets = new Set<net.Socket>();
  let count = 0;
  let waiting: (() => void)[] = [];
  const server = net.createServer((socket) => {
    count++;
    sockets.add(socket);
    socket.on('close', () => sockets.delete(socket));
    socket.on('error', () => undefined);
    const wake = waiting;
    waiting = [];
    for (const resolve of wake) resolve();
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as net.AddressInfo;
  const dropAll = () => {
    for (const socket of sockets) socket.destroy();
  };
  return {
    url: `smtp://127.0.0.1:${port}`,
    connections: () => count,
    nextConnection: () => new Promise<void>((resolve) => waiting.push(resolve)),
    dropAll,
    close: () => {
      dropAll();
      return new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}
