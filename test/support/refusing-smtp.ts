import net from 'node:net';

/**
 * A real SMTP server on loopback that refuses every recipient for good (550), as a mail server does for an address
 * that does not exist (RFC 5321 §4.2.2 reply codes). Speaks just enough SMTP for nodemailer to get that far.
 */
export async function startRefusingSmtp(): Promise<{ port: number; refusals: () => number; stop: () => Promise<void> }> {
  let refusals = 0;
  const sockets = new Set<net.Socket>();
  const server = net.createServer((socket) => {
    sockets.add(socket);
    socket.on('close', () => sockets.delete(socket));
    socket.write('220 refusing.test ESMTP\r\n');
    let buffered = '';
    socket.on('data', (chunk) => {
      buffered += chunk.toString('latin1');
      let end: number;
      while ((end = buffered.indexOf('\r\n')) >= 0) {
        const line = buffered.slice(0, end).toUpperCase();
        buffered = buffered.slice(end + 2);
        if (line.startsWith('EHLO') || line.startsWith('HELO')) socket.write('250 refusing.test\r\n');
        else if (line.startsWith('MAIL FROM')) socket.write('250 OK\r\n');
        else if (line.startsWith('RCPT TO')) { refusals += 1; socket.write('550 5.1.1 No such mailbox here\r\n'); }
        else if (line.startsWith('QUIT')) { socket.write('221 Bye\r\n'); socket.end(); }
        else socket.write('250 OK\r\n');
      }
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  return {
    port: (server.address() as net.AddressInfo).port,
    refusals: () => refusals,
    stop: async () => {
      for (const s of sockets) s.destroy();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}
