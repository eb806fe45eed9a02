import { format } from 'date-fns'

/** Today on the server's calendar, as YYYY-MM-DD. */
export function todayIso() {
  return format(new Date(), 'yyyy-MM-dd')
}
