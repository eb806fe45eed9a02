/**
 * Rules engine from the command line: reads one request or an array of requests as JSON on
 * standard input and writes one result or an array, in the same order, as JSON on standard
 * output. A request that cannot be evaluated gives { "error": "..." } in its place; the exit
 * code stays 0. Run as `npm run --silent rules`.
 */
import { evaluateAll } from '../shared/rules/index'

async function readStdin(): Promise<string> {
  const chunks: Buffer[] = []
  for await (const chunk of process.stdin) chunks.push(typeof chunk === 'string' ? Buffer.from(chunk) : chunk)
  return Buffer.concat(chunks).toString('utf8')
}

function answer(text: string): unknown {
  if (text.trim() === '') return { error: 'no input: send one request or an array of requests as JSON on standard input' }
  let parsed: unknown
  try {
    parsed = JSON.parse(text)
  }
  catch (error) {
    return { error: `malformed JSON: ${error instanceof Error ? error.message : String(error)}` }
  }
  return evaluateAll(parsed)
}

readStdin()
  .then(text => process.stdout.write(`${JSON.stringify(answer(text))}\n`))
  .catch((error: unknown) => {
    process.stdout.write(`${JSON.stringify({ error: `could not read standard input: ${error instanceof Error ? error.message : String(error)}` })}\n`)
  })
