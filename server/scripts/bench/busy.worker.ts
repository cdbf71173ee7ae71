/**
 * The busy phase's clients (a sizing and a record upload) in a thread of their own, so sending
 * 8 MB never stalls the thread that probes the health: as with real clients, whose uploads never
 * delay another client's requests. Builds the record, says `ready`, and on each message sends both
 * requests and answers with what failed of them.
 */
import { parentPort, workerData } from 'node:worker_threads'
import type { SizingInput } from '../../../shared/schemas/sizing'
import { recordFile, sizeAndUpload } from './requests'

const job = workerData as { base: string; cookie: string; sizing: SizingInput; bytes: number }
const port = parentPort!
const record = recordFile(job.bytes)
port.on('message', () => {
  void sizeAndUpload(job.base, job.cookie, job.sizing, record).then((failures) =>
    port.postMessage(failures),
  )
})
port.postMessage('ready')
