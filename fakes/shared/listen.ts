import type { Server } from 'node:http'
import type { AddressInfo } from 'node:net'

/**
 * Starts listening and resolves with the port actually bound, so callers may ask for port 0.
 * Rejects when the port is taken instead of crashing the process.
 */
export function listen(server: Server, port: number, host: string): Promise<number> {
  return new Promise((resolve, reject) => {
    const onError = (err: Error): void => reject(err)
    server.once('error', onError)
    server.listen(port, host, () => {
      server.off('error', onError)
      resolve((server.address() as AddressInfo).port)
    })
  })
}

/**
 * Stops the server and drops idle keep-alive sockets; SDK clients keep connections open,
 * and close() alone would wait for them.
 */
export function closeServer(server: Server): Promise<void> {
  return new Promise((resolve, reject) => {
    server.close((err) => (err ? reject(err) : resolve()))
    server.closeAllConnections()
  })
}
