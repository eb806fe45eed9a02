import { describe, expect, it } from 'vitest'
import { describeLetters, qw4619, testPositionsAllowed } from '../../../../../shared/rules/asme-ix/positions'

// Table QW-461.9 (docs/sources.md §A3): the test positions each form and weld type has, the † footnote on plate tests,
// and the pipe fillet rows, which Rootface carries from memory (§A3) and says so.
describe('QW-461.9 rows, footnotes and refusals', () => {
  it('lists the test positions of each row group', () => {
    expect(testPositionsAllowed('plate', 'groove')).toEqual(['1G', '2G', '3G', '4G'])
    expect(testPositionsAllowed('pipe', 'groove')).toEqual(['1G', '2G', '5G', '6G'])
    expect(testPositionsAllowed('plate', 'fillet')).toEqual(['1F', '2F', '3F', '4F'])
    expect(testPositionsAllowed('pipe', 'fillet')).toEqual(['1F', '2F', '2FR', '4F', '5F'])
  })
  it('† applies to plate tests only: column B for plate grooves, column C for plate fillets', () => {
    expect(qw4619('plate', 'groove', ['1G'])).toMatchObject({ groovePipeDagger: true, filletPipeDagger: false, fromMemory: false })
    expect(qw4619('plate', 'fillet', ['1F'])).toMatchObject({ groovePipeDagger: false, filletPipeDagger: true, fromMemory: false })
    expect(qw4619('pipe', 'groove', ['1G'])).toMatchObject({ groovePipeDagger: false, filletPipeDagger: false, fromMemory: false })
  })
  it('a pipe fillet row marks the answer as from memory, also when combined with another row; lower case is read', () => {
    expect(qw4619('pipe', 'fillet', ['2fr']).fromMemory).toBe(true)
    expect(qw4619('pipe', 'fillet', ['2FR'])).toMatchObject({ groove: [], groovePipe: [], fillet: ['F', 'H'] }) // 2FR: F and H
    expect(qw4619('pipe', 'fillet', ['1F', '4F']).fillet).toEqual(['F', 'H', 'O'])
  })
  it('refuses an empty list and a position the row group does not have, naming the ones it has', () => {
    expect(() => qw4619('plate', 'groove', [])).toThrow('testPositions: give at least one test position')
    expect(() => qw4619('plate', 'groove', ['5G'])).toThrow('testPositions: 5G is not a plate groove test position in QW-461.9 (1G, 2G, 3G, 4G)')
    expect(() => qw4619('pipe', 'fillet', ['3F'])).toThrow('(1F, 2F, 2FR, 4F, 5F)')
  })
  it('describes letters in words: none, all positions, or the list', () => {
    expect(describeLetters([])).toBe('none')
    expect(describeLetters(['F', 'H', 'V', 'O'])).toBe('all positions (F, H, V, O)')
    expect(describeLetters(['F', 'H', 'V'])).toBe('F, H, V')
  })
})
