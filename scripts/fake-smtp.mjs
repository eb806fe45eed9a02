// A local SMTP server that accepts every message and keeps it in memory: for `npm run dev` and the API tests.
// Nothing leaves the machine. STARTTLS is off (the certificate built into smtp-server has expired).
import { SMTPServer } from 'smtp-server'
import { simpleParser } from 'mailparser'

/** @param {{ port?: number, host?: string, log?: (line: string) => void }} [options] */
export async function startFakeSmtp(options = {}) {
  const host = options.host ?? '127.0.0.1'
  /** @type {import('./fake-smtp.d.mts').ReceivedMail[]} */
  const messages = []
  const waiters = new Set()
  let refuse = 0
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, session, callback) {
      const chunks = []
      stream.on('data', c => chunks.push(c))
      stream.on('end', async () => {
        if (refuse > 0) {
          refuse--
          const error = Object.assign(new Error('fake SMTP: try again later'), { responseCode: 451 })
          return callback(error)
        }
        try {
          const raw = Buffer.concat(chunks)
          const parsed = await simpleParser(raw)
          const mail = {
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            to: session.envelope.rcptTo.map(r => r.address),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : '',
            headers: Object.fromEntries([...parsed.headers].map(([k, v]) => [k, typeof v === 'string' ? v : JSON.stringify(v)])),
            receivedAt: new Date(),
          }
          messages.push(mail)
          options.log?.(`[fake smtp] ${mail.to.join(', ')} · ${mail.subject}`)
          for (const w of waiters) w()
          callback()
        }
        catch (error) {
          callback(error)
        }
      })
    },
  })
  await new Promise((resolve, reject) => {
    server.once('error', reject)
    server.listen(options.port ?? 0, host, () => {
      server.off('error', reject)
      resolve(undefined)
    })
  })
  const address = server.server.address()
  const port = typeof address === 'object' && address ? address.port : 0
  return {
    port,
    url: `smtp://${host}:${port}`,
    messages,
    /** The next `count` deliveries are refused with a temporary error (451), to exercise retries. */
    refuseNext(count = 1) {
      refuse = count
    },
    /** Resolves once at least `count` messages have arrived (or rejects after `timeoutMs`). */
    waitFor(count, timeoutMs = 10_000) {
      return new Promise((resolve, reject) => {
        const check = () => {
          if (messages.length >= count) {
            waiters.delete(check)
            clearTimeout(timer)
            resolve(messages)
          }
        }
        const timer = setTimeout(() => {
          waiters.delete(check)
          reject(new Error(`fake SMTP: ${messages.length} of ${count} messages after ${timeoutMs} ms`))
        }, timeoutMs)
        waiters.add(check)
        check()
      })
    },
    close: () => new Promise(resolve => server.close(() => resolve(undefined))),
  }
}
