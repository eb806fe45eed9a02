import { format } from 'date-fns'
import type { Db } from '../database/client'
import { standingsOf } from '../database/standings'
import type { ProcessStanding } from '#shared/qualification/process-standing'

export function todayIso() {
  return format(new Date(), 'yyyy-MM-dd')
}

/** Per welder, per process: where each stands today, from the latest certified test and the continuity log. */
export function standingsOfWelders(db: Db, welderIds: number[], today = todayIso()): Promise<Map<number, ProcessStanding[]>> {
  return standingsOf(db, welderIds, today)
}
