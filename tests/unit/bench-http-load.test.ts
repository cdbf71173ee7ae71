import http from 'node:http'
import type { AddressInfo } from 'node:net'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { client, concurrentP95, FAILED, scheduledP95 } from '../../server/scripts/bench/http-load'

// A server that answers most GETs and resets the kept-alive socket of every fifth one, the way a
// server under load or closing idle sockets does.
let server: http.Server
let base = ''
let served = 0
beforeAll(async () => {
  server = http.createServer((req, res) => {
    served++
    if (served % 5 === 0) req.socket.destroy()
    else res.end('[]')
  })
  server.listen(0, '127.0.0.1')
  await new Promise((r) => server.once('listening', r))
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`
})
afterAll(() => {
  server.closeAllConnections()
  server.close()
})

describe('the benchmark load generator', () => {
  it('answers a reset connection with a failed status instead of throwing', async () => {
    const c = client(base, '', 2)
    const answers = await Promise.all(Array.from({ length: 10 }, () => c.get('/x')))
    c.close()
    expect(answers.filter((a) => a.status === FAILED).length).toBeGreaterThan(0)
    expect(answers.filter((a) => a.status === 200).length).toBeGreaterThan(0)
    for (const a of answers.filter((x) => x.status === FAILED)) expect(a.error).toBeTruthy()
  })

  it('counts reset connections under concurrent load and keeps going to the end', async () => {
    const c = client(base, '', 4)
    const load = await concurrentP95(c, '/x', 4, 0.5, 5)
    c.close()
    expect(load.count).toBeGreaterThan(10)
    expect(load.errors?.count).toBeGreaterThan(0)
    expect(load.errors?.note).toMatch(/\d+ [A-Z]+/)
    expect(load.p95).toBeGreaterThan(0)
  })

  it('leaves failed probes out of the scheduled p95 and counts them', async () => {
    const c = client(base, '', 2)
    const probes = await scheduledP95(c, '/x', 5, 40)
    c.close()
    expect(probes.count + probes.errors).toBe(40)
    expect(probes.errors).toBeGreaterThan(0)
  })
})
