// Prints the first free TCP port on 127.0.0.1 at or above the one given.
const net = require('node:net');
const start = Number(process.argv[2] || 3000);
function tryPort(port) {
  const server = net.createServer();
  server.once('error', () => tryPort(port + 1));
  server.once('listening', () => server.close(() => console.log(port)));
  server.listen(port, '127.0.0.1');
}
tryPort(start);
