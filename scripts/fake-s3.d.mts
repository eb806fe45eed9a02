export interface FakeS3 {
  endpoint: string
  bucket: string
  env: Record<'S3_BUCKET' | 'S3_ENDPOINT' | 'S3_REGION' | 'S3_ACCESS_KEY_ID' | 'S3_SECRET_ACCESS_KEY' | 'S3_FORCE_PATH_STYLE', string>
  close: () => Promise<void>
}

export function startFakeS3(options: { directory: string, port?: number, host?: string, bucket?: string }): Promise<FakeS3>
