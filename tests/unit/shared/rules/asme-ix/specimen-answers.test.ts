import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'

// Whether the specimens cut from an ASME IX welder coupon make a set the table asks for, and the words for it.
// QW-452.1(a) (docs/sources.md §A2a, read): under 3/8 in face and root; 3/8 in to under 3/4 in side bends, or face
// and root in equal numbers; 3/4 in and over side bends. QW-452.5 (§A2.5, counts read): a fillet coupon of 3/16 in
// or more, 1 macro and 1 fracture; under it, 1 macro. Sentences: Rootface's.
const sp = (test: Record<string, unknown>, types: string[]) =>
  ok({ code: 'asme-ix', check: 'specimens', unit: 'in', input: { test, specimens: types.map(type => ({ type })) } })
const plate = (t: number) => ({ process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['3G'], couponThickness: t })
const fillet = (t: number) => ({ process: 'SMAW', form: 'plate', weld: 'fillet', testPositions: ['3F'], couponThickness: t })

describe('ASME IX specimen sets, answers in full', () => {
  it('1/2 in plate: 2 side or 1 face + 1 root; one side bend is short by one', () => {
    const r = sp(plate(0.5), ['side'])
    expect([r.answer, r.complete, r.allowed, r.given, r.missing]).toEqual(['incomplete', false, [{ side: 2 }, { face: 1, root: 1 }], { side: 1 }, ['1 side']])
    expect(r.reasons).toEqual([
      { clause: 'QW-452.1(a)', text: 'Weld metal of 1/2 in: 2 side bends (face and root bends in equal numbers may replace them).', basis: 'verified' },
      { clause: 'QW-452.1(a)', text: 'Incomplete: the table asks for 2 side, or 1 face + 1 root; given 1 side (missing 1 side).', basis: 'verified' },
    ])
    const done = sp(plate(0.5), ['root', 'face'])
    expect([done.answer, done.complete, done.missing]).toEqual(['complete', true, []])
    expect((done.reasons as { text: string }[])[1]!.text).toBe('The specimens (1 face + 1 root) make the set 1 face + 1 root.')
  })
  it('the nearest set is named: 1 face given toward 1 face + 1 root, not 2 side', () => {
    expect(sp(plate(0.5), ['face']).missing).toEqual(['1 root'])
    expect(sp(plate(0.5), []).missing).toEqual(['2 side'])
  })
  it('boundaries: just under 3/8 in face and root only; 3/8 in both sets; just under 3/4 in both; 3/4 in side only', () => {
    expect(sp(plate(0.374), ['side', 'side']).allowed).toEqual([{ face: 1, root: 1 }])
    expect(sp(plate(0.375), ['side', 'side']).allowed).toEqual([{ side: 2 }, { face: 1, root: 1 }])
    expect(sp(plate(0.749), ['side', 'side']).allowed).toEqual([{ side: 2 }, { face: 1, root: 1 }])
    expect(sp(plate(0.75), ['side', 'side']).allowed).toEqual([{ side: 2 }])
  })
  it('fillet coupons: 3/16 in macro and fracture; just under, one macro', () => {
    const thick = sp(fillet(0.1875), ['macro', 'fracture'])
    expect([thick.answer, thick.allowed]).toEqual(['complete', [{ macro: 1, fracture: 1 }]])
    expect(thick.reasons).toEqual([
      { clause: 'QW-452.5', text: 'Fillet test coupon of 3/16 in: 1 macro (QW-184) and 1 fracture (QW-182).', basis: 'partial' },
      { clause: 'QW-452.5', text: 'The specimens (1 macro + 1 fracture) make the set 1 macro + 1 fracture.', basis: 'partial' },
    ])
    const thin = sp(fillet(0.18), [])
    expect([thin.answer, thin.allowed, thin.given, thin.missing]).toEqual(['incomplete', [{ macro: 1 }], {}, ['1 macro']])
    expect((thin.reasons as { text: string }[]).map(x => x.text)).toEqual([
      'Fillet test coupon of 0.18 in: 1 macro (QW-184).',
      'Incomplete: the table asks for 1 macro; given none (missing 1 macro).',
    ])
  })
  it('a combination coupon counts the deposits of its processes together (QW-452.1(a): total weld metal)', () => {
    const combo = { form: 'plate', weld: 'groove', testPositions: ['3G'], processes: [{ process: 'GTAW', depositThickness: 0.125 }, { process: 'SMAW', depositThickness: 0.25 }] }
    expect(sp(combo, ['side', 'side']).allowed).toEqual([{ side: 2 }, { face: 1, root: 1 }]) // 3/8 in in all
    const unknown = sp({ ...combo, processes: [{ process: 'GTAW', depositThickness: 0.125 }, { process: 'SMAW' }] }, [])
    expect(unknown.answer).toBe('cannot-tell') // no coupon thickness to fall back on
  })
})
