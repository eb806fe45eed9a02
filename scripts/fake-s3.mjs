// A local S3-compatible server (s3rver) keeping objects in a folder: for the API tests, and for trying the S3 path by hand.
import S3rver from 's3rver'

/** @param {{ directory: string, port?: number, host?: string, bucket?: string }} options */
export async function startFakeS3(options) {
  const host = options.host ?? '127.0.0.1'
  const bucket = options.bucket ?? 'rootface-files'
  const server = new S3rver({ address: host, port: options.port ?? 0, silent: true, directory: options.directory, configureBuckets: [{ name: bucket }] })
  const address = await server.run()
  const endpoint = `http://${host}:${address.port}`
  return {
    endpoint,
    bucket,
    // s3rver accepts this fixed key pair
    env: { S3_BUCKET: bucket, S3_ENDPOINT: endpoint, S3_REGION: 'us-east-1', S3_ACCESS_KEY_ID: 'S3RVER', S3_SECRET_ACCESS_KEY: 'S3RVER', S3_FORCE_PATH_STYLE: 'true' },
    close: () => server.close(),
  }
}
