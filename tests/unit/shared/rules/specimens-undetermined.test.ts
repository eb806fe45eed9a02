import { describe, expect, it } from 'vitest'
import { ok } from './helpers'

type Obj = Record<string, unknown>
interface Ranges {
  positions: { groove: string[], fillet: string[] }
  depositMax?: number | null
  undetermined?: { field: string, needed: string }[]
  deposits?: { process: string, depositMax?: number | null }[]
  combinedDepositMax?: number | null
}
const ranges = (code: string, input: Obj, unit: 'in' | 'mm' = 'in') => ok({ code, check: 'welder-ranges', unit, input }) as unknown as Ranges
const specimens = (code: string, test: Obj, types: string[], unit: 'in' | 'mm' = 'in') =>
  ok({ code, check: 'specimens', unit, input: { test, specimens: types.map(type => ({ type })) } }) as unknown as { answer: string, complete: boolean, missing: string[] }

describe('what the inputs determine is computed; the rest is listed under undetermined', () => {
  it('a 3G plate test without thickness still gives its positions (QW-461.9, read)', () => {
    const r = ranges('asme-ix', { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['3G'] })
    expect(r.positions.groove).toEqual(['F', 'V'])
    expect(r.undetermined?.map(u => u.field)).toEqual(['depositThickness'])
  })
  it('a pipe test without OD still gives its positions (QW-461.9 6G: all, read)', () => {
    const r = ranges('asme-ix', { process: 'GTAW', form: 'pipe', weld: 'groove', testPositions: ['6G'], couponThickness: 0.28 })
    expect(r.positions.groove).toEqual(['F', 'H', 'V', 'O'])
    expect(r.undetermined?.map(u => u.field)).toEqual(['outsideDiameter'])
  })
  it('a fillet test without coupon thickness still gives its positions (QW-461.9 3F: F, H, V, read)', () => {
    const r = ranges('asme-ix', { process: 'SMAW', form: 'plate', weld: 'fillet', testPositions: ['3F'] })
    expect(r.positions.fillet).toEqual(['F', 'H', 'V'])
    expect(r.undetermined?.map(u => u.field)).toEqual(['couponThickness'])
  })
  it('AWS D1.1 and ISO 9606-1 likewise (Table 6.10 3G → F, H, V, read; ISO Table 9 PF → PA, PF, summary sheet)', () => {
    expect(ranges('aws-d1.1', { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['3G'] }).positions.groove).toEqual(['F', 'H', 'V'])
    expect(ranges('iso-9606-1', { process: '111', form: 'plate', weld: 'groove', testPositions: ['PF'] }, 'mm').positions.groove).toEqual(['PA', 'PF'])
  })
  it('a combination coupon: each process its own deposit (QW-452.1(b) Note 1: 2t; 1/2 in in 3 layers: the maximum, read)', () => {
    const r = ranges('asme-ix', { form: 'pipe', weld: 'groove', testPositions: ['6G'], outsideDiameter: 6.625, processes: [{ process: 'GTAW', depositThickness: 0.125 }, { process: 'SMAW', depositThickness: 0.5, layers: 4 }] })
    expect(r.deposits).toEqual([expect.objectContaining({ process: 'GTAW', depositMax: 0.25 }), expect.objectContaining({ process: 'SMAW', depositMax: null })])
    expect(r.combinedDepositMax).toBeNull()
  })
})

describe('specimen sets against the table for the coupon', () => {
  const pipe6G = { process: 'SMAW', form: 'pipe', weld: 'groove', testPositions: ['6G'], outsideDiameter: 6.625, couponThickness: 0.375 }
  it('a 6G coupon of 3/8 in with four face bends and no root bend is incomplete (QW-452.1(a), read: 4 side, or 2 face + 2 root)', () => {
    const r = specimens('asme-ix', pipe6G, ['face', 'face', 'face', 'face'])
    expect([r.answer, r.complete, r.missing]).toEqual(['incomplete', false, ['2 root']])
  })
  it('the same coupon is complete with 4 side, or 2 face + 2 root', () => {
    expect(specimens('asme-ix', pipe6G, ['side', 'side', 'side', 'side']).answer).toBe('complete')
    expect(specimens('asme-ix', pipe6G, ['face', 'root', 'face', 'root']).answer).toBe('complete')
  })
  it('under 3/8 in only face and root; 3/4 in and over only side (QW-452.1(a), read)', () => {
    expect(specimens('asme-ix', { ...pipe6G, couponThickness: 0.28 }, ['side', 'side', 'side', 'side']).answer).toBe('incomplete')
    expect(specimens('asme-ix', { ...pipe6G, couponThickness: 0.75 }, ['face', 'root', 'face', 'root']).answer).toBe('incomplete')
  })
  it('a fillet test of 3/16 in or more needs a macro and a fracture (QW-452.5, counts read)', () => {
    expect(specimens('asme-ix', { process: 'SMAW', form: 'plate', weld: 'fillet', testPositions: ['2F'], couponThickness: 0.375 }, ['macro']).answer).toBe('incomplete')
  })
  it('AWS D1.1 plate over 3/8 in: 2 side bends (from memory); a 5G pipe over 4 in, 3/8 in wall: 2 face + 2 root (Table 10.13, read)', () => {
    expect(specimens('aws-d1.1', { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['3G'], couponThickness: 1 }, ['face', 'root']).answer).toBe('incomplete')
    expect(specimens('aws-d1.1', { process: 'SMAW', form: 'pipe', weld: 'groove', testPositions: ['5G'], couponThickness: 0.375, outsideDiameter: 6.625 }, ['face', 'root', 'face', 'root']).answer).toBe('complete')
  })
  it('ISO 9606-1 and D1.3 specimen tables are not carried: cannot tell, never complete', () => {
    expect(specimens('iso-9606-1', { process: '111', form: 'plate', weld: 'groove', testPositions: ['PA'], depositThickness: 10 }, ['face', 'root'], 'mm').answer).toBe('cannot-tell')
  })
})

describe('PQR toughness results against the acceptance values the user enters', () => {
  const judge = (input: Obj) => ok({ code: 'asme-ix', check: 'toughness', unit: 'in', input }) as unknown as { answer: string, averageEnergy: number }
  const three = [{ energy: 25, lateralExpansion: 18 }, { energy: 16, lateralExpansion: 16 }, { energy: 22, lateralExpansion: 14 }]
  it('average and single energy (values entered by the user, arithmetic checked by hand: (25 + 16 + 22) / 3 = 21)', () => {
    expect(judge({ specimens: three, acceptance: { averageEnergy: 20, singleEnergy: 15 } })).toMatchObject({ answer: 'accepted', averageEnergy: 21 })
    expect(judge({ specimens: three, acceptance: { averageEnergy: 22 } }).answer).toBe('rejected')
    expect(judge({ specimens: three, acceptance: { singleEnergy: 17 } }).answer).toBe('rejected')
  })
  it('lateral expansion: every specimen at least the value entered; missing on one specimen → cannot tell', () => {
    expect(judge({ specimens: three, acceptance: { lateralExpansion: 15 } }).answer).toBe('rejected')
    expect(judge({ specimens: [...three, { energy: 30 }], acceptance: { lateralExpansion: 10 } }).answer).toBe('cannot-tell')
  })
  it('no acceptance value entered: cannot tell', () => {
    expect(judge({ specimens: three, acceptance: {} }).answer).toBe('cannot-tell')
  })
})
