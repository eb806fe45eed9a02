import { createHash } from 'node:crypto'
import { describe, expect, it } from 'vitest'
import { canonicalJson, newVerifyCode, sha256Hex } from '../../../../server/database/signing'

describe('signed content', () => {
  it('canonical JSON sorts keys at every depth and drops undefined', () => {
    expect(canonicalJson({ b: 1, a: { d: [2, { z: 1, y: null }], c: 'x' }, u: undefined })).toBe('{"a":{"c":"x","d":[2,{"y":null,"z":1}]},"b":1}')
    expect(canonicalJson({ a: 1, b: 2 })).toBe(canonicalJson({ b: 2, a: 1 }))
  })

  it('SHA-256 matches the FIPS 180-2 test vector for "abc"', () => {
    // FIPS 180-2, Appendix B.1
    expect(sha256Hex('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad')
    expect(sha256Hex('Ø weld')).toBe(createHash('sha256').update(Buffer.from('Ø weld', 'utf8')).digest('hex'))
  })

  it('verification codes are 10 unambiguous characters and do not repeat', () => {
    const codes = new Set(Array.from({ length: 2000 }, newVerifyCode))
    expect(codes.size).toBe(2000)
    for (const code of codes) expect(code).toMatch(/^[A-HJKMNP-TV-Z2-9]{10}$/)
  })
})
