import { describe, expect, it } from 'vitest'
import { parseWeldLog } from '../../../../server/utils/weld-log-csv'

describe('reading a weld log file', () => {
  it('reads mark, stamp, process and date, with optional layer and F-No., whatever the header\'s case and spacing', () => {
    const { rows, errors } = parseWeldLog('\uFEFFMark,Welder Stamp,process,Welded On,Layer,F-No.\nA-1,KB-04,smaw,2026-11-30,root,4\nA-2,KB-05,GTAW,2026-11-29,,\n')
    expect(errors).toEqual([])
    expect(rows).toEqual([
      { line: 2, mark: 'A-1', stamp: 'KB-04', process: 'SMAW', weldedOn: '2026-11-30', layer: 'root', fNumber: 4 },
      { line: 3, mark: 'A-2', stamp: 'KB-05', process: 'GTAW', weldedOn: '2026-11-29', layer: null, fNumber: null },
    ])
  })

  it('names the line, column and value of each bad field, and a missing column once', () => {
    const { rows, errors } = parseWeldLog('mark,stamp,process,date\nA-1,KB-04,LASER,2026-02-30\n')
    expect(rows).toEqual([])
    expect(errors.map(e => [e.line, e.field, e.value])).toEqual([[2, 'process', 'LASER'], [2, 'weldedOn', '2026-02-30']])
    expect(parseWeldLog('mark,stamp,date\nA,B,2026-01-01\n').errors).toEqual([expect.objectContaining({ line: 1, field: 'header', message: expect.stringContaining('process') })])
  })
})
