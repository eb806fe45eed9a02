import { createHash } from 'node:crypto'
import { existsSync, mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { GetObjectCommand, ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startFakeS3, type FakeS3 } from '../../scripts/fake-s3.mjs'
import { signedIn, startServer, type TestServer } from './harness'
import { samplePdf, samplePng, upload } from './support/files'

// Issue 7: with S3_* set, files go to an S3-compatible bucket (here the local fake, s3rver) instead of the disk.
const sha = (b: Uint8Array) => createHash('sha256').update(b).digest('hex')

let s3: FakeS3
let s3Dir: string
let server: TestServer
let client: S3Client

beforeAll(async () => {
  s3Dir = mkdtempSync(join(tmpdir(), 'rootface-s3-'))
  s3 = await startFakeS3({ directory: s3Dir, bucket: 'shop-files' })
  server = await startServer({ env: { ...s3.env, S3_PREFIX: 'rootface' } })
  client = new S3Client({
    region: 'us-east-1', endpoint: s3.endpoint, forcePathStyle: true, credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
    requestChecksumCalculation: 'WHEN_REQUIRED', responseChecksumValidation: 'WHEN_REQUIRED',
  })
})
afterAll(async () => {
  await server?.stop()
  await s3?.close()
  rmSync(s3Dir, { recursive: true, force: true })
})

describe('files in an S3-compatible bucket', () => {
  it('an upload lands in the bucket byte for byte, comes back through the download route, and leaves the disk alone', async () => {
    const supervisor = await signedIn(server.url, 'supervisor')
    const test = (await supervisor.json<{ items: { id: number, welderStamp: string }[] }>('/api/tests?pageSize=200')).body.items.find(t => t.welderStamp === 'KB-07')!
    const res = await upload(supervisor, { recordType: 'welder-test', recordId: test.id, kind: 'radiography-report' }, { name: 'rt.pdf', type: 'application/pdf', bytes: samplePdf })
    expect(res.status).toBe(201)
    const photo = await upload(supervisor, { recordType: 'welder-test', recordId: test.id, kind: 'coupon-photo' }, { name: 'coupon.png', type: 'image/png', bytes: samplePng })
    expect(photo.status).toBe(201)

    const listed = await client.send(new ListObjectsV2Command({ Bucket: 'shop-files' }))
    const keys = (listed.Contents ?? []).map(o => o.Key!)
    expect(keys).toHaveLength(3) // the PDF, the PNG and the PNG's thumbnail
    expect(keys.length, 'a check over an empty list proves nothing').toBeGreaterThan(0)
    expect(keys.every(k => k.startsWith(`rootface/welder-test/${test.id}/`))).toBe(true)
    expect(keys.filter(k => k.endsWith('.thumbnail'))).toHaveLength(1)
    const stored = await Promise.all(keys.filter(k => !k.endsWith('.thumbnail')).map(async Key => sha(await (await client.send(new GetObjectCommand({ Bucket: 'shop-files', Key }))).Body!.transformToByteArray())))
    expect(stored.sort()).toEqual([sha(samplePdf), sha(samplePng)].sort())

    const download = await supervisor.fetch(`/api/attachments/${res.body.id}`)
    expect(download.status).toBe(200)
    expect(sha(new Uint8Array(await download.arrayBuffer()))).toBe(sha(samplePdf))
    expect(existsSync(join(server.dataDir, 'files'))).toBe(false)

    expect((await supervisor.fetch(`/api/attachments/${photo.body.id}/thumbnail`)).status).toBe(200)
  })
})
