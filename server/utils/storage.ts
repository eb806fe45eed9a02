import { dirname, isAbsolute, join, resolve } from 'node:path'
import { DeleteObjectCommand, GetObjectCommand, HeadObjectCommand, ListObjectsV2Command, NoSuchKey, PutObjectCommand, S3Client } from '@aws-sdk/client-s3'
import { defineDriver } from 'unstorage'
import fsDriver from 'unstorage/drivers/fs'

// Uploaded files go through Nitro's storage layer under one mount. By default it is a folder on local disk
// (NUXT_FILES_DIR, or 'files' beside the data directory, i.e. .data/files); with S3_BUCKET set it is an
// S3-compatible bucket through @aws-sdk/client-s3. Files are never served from a public folder.

const mountName = 'rootface-files'

export interface S3Settings {
  bucket: string
  prefix: string
  region: string
  endpoint?: string
  forcePathStyle: boolean
  credentials?: { accessKeyId: string, secretAccessKey: string }
}

/** S3_BUCKET switches files to a bucket; S3_ENDPOINT, S3_REGION, S3_ACCESS_KEY_ID, S3_SECRET_ACCESS_KEY, S3_PREFIX, S3_FORCE_PATH_STYLE refine it. */
export function s3Settings(env = process.env): S3Settings | null {
  if (!env.S3_BUCKET) return null
  const endpoint = env.S3_ENDPOINT || undefined
  return {
    bucket: env.S3_BUCKET,
    prefix: (env.S3_PREFIX ?? '').replace(/^\/+|\/+$/g, ''),
    region: env.S3_REGION || 'us-east-1',
    endpoint,
    // Most S3-compatible servers want bucket-in-path addresses; AWS itself takes either.
    forcePathStyle: env.S3_FORCE_PATH_STYLE ? env.S3_FORCE_PATH_STYLE !== 'false' : !!endpoint,
    credentials: env.S3_ACCESS_KEY_ID && env.S3_SECRET_ACCESS_KEY
      ? { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY }
      : undefined,
  }
}

/** An unstorage driver over S3: keys 'a:b:c' become objects 'prefix/a/b/c'. */
export const s3Driver = defineDriver((settings: S3Settings) => {
  const client = new S3Client({
    region: settings.region, endpoint: settings.endpoint, forcePathStyle: settings.forcePathStyle, credentials: settings.credentials,
    // Without these, streamed bodies get trailing checksums that some S3-compatible servers store as part of the object.
    requestChecksumCalculation: 'WHEN_REQUIRED', responseChecksumValidation: 'WHEN_REQUIRED',
  })
  const objectKey = (key: string) => [settings.prefix, key.replace(/:/g, '/')].filter(Boolean).join('/')
  const bucket = settings.bucket
  const getRaw = async (key: string) => {
    try {
      const res = await client.send(new GetObjectCommand({ Bucket: bucket, Key: objectKey(key) }))
      return res.Body ? Buffer.from(await res.Body.transformToByteArray()) : null
    }
    catch (error) {
      if (error instanceof NoSuchKey || (error as { name?: string }).name === 'NoSuchKey') return null
      throw error
    }
  }
  return {
    name: 'rootface-s3',
    async hasItem(key) {
      try {
        await client.send(new HeadObjectCommand({ Bucket: bucket, Key: objectKey(key) }))
        return true
      }
      catch (error) {
        if ((error as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode === 404) return false
        throw error
      }
    },
    async getItem(key) {
      return (await getRaw(key))?.toString('utf8') ?? null
    },
    getItemRaw: getRaw,
    async setItem(key, value) {
      await client.send(new PutObjectCommand({ Bucket: bucket, Key: objectKey(key), Body: value }))
    },
    async setItemRaw(key, value: Buffer | Uint8Array, opts: { contentType?: string }) {
      await client.send(new PutObjectCommand({ Bucket: bucket, Key: objectKey(key), Body: value, ContentType: opts?.contentType, ContentLength: value.length }))
    },
    async removeItem(key) {
      await client.send(new DeleteObjectCommand({ Bucket: bucket, Key: objectKey(key) }))
    },
    async getKeys(base) {
      const prefix = objectKey(base ?? '')
      const keys: string[] = []
      let token: string | undefined
      do {
        const page = await client.send(new ListObjectsV2Command({ Bucket: bucket, Prefix: prefix || undefined, ContinuationToken: token }))
        for (const o of page.Contents ?? []) if (o.Key) keys.push(o.Key.slice(settings.prefix ? settings.prefix.length + 1 : 0).replace(/\//g, ':'))
        token = page.IsTruncated ? page.NextContinuationToken : undefined
      } while (token)
      return keys
    },
  }
})

/** Where files live on local disk: absolute, so it does not depend on the working directory. */
export function filesDir() {
  const config = useRuntimeConfig()
  const configured = String(config.filesDir || '')
  if (configured) return isAbsolute(configured) ? configured : resolve(configured)
  return join(dirname(resolve(String(config.dataDir))), 'files')
}

let mounted: 'disk' | 's3' | undefined

/** The files mount of Nitro's storage, set up on first use. */
export function useFileStorage() {
  const storage = useStorage()
  if (!mounted) {
    const s3 = s3Settings()
    storage.mount(mountName, s3 ? s3Driver(s3) : fsDriver({ base: filesDir() }))
    mounted = s3 ? 's3' : 'disk'
  }
  return storage
}

export function fileStorageKind() {
  useFileStorage()
  return mounted!
}

export async function putStoredFile(key: string, data: Buffer, contentType: string) {
  await useFileStorage().setItemRaw(`${mountName}:${key}`, data, { contentType })
}

export async function readStoredFile(key: string): Promise<Buffer | null> {
  const raw = await useFileStorage().getItemRaw(`${mountName}:${key}`)
  if (raw == null) return null
  return Buffer.isBuffer(raw) ? raw : Buffer.from(raw as Uint8Array)
}

export async function removeStoredFile(key: string) {
  await useFileStorage().removeItem(`${mountName}:${key}`)
}
