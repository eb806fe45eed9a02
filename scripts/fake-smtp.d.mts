export interface ReceivedMail {
  from: string
  to: string[]
  subject: string
  text: string
  html: string
  headers: Record<string, string>
  receivedAt: Date
}

export interface FakeSmtp {
  port: number
  url: string
  messages: ReceivedMail[]
  refuseNext: (count?: number) => void
  waitFor: (count: number, timeoutMs?: number) => Promise<ReceivedMail[]>
  close: () => Promise<void>
}

export function startFakeSmtp(options?: { port?: number, host?: string, log?: (line: string) => void }): Promise<FakeSmtp>
