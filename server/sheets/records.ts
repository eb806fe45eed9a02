// What a sheet is built from is read in server/database/sheet-records.ts. packet.ts still imports these from here.
export { pqrIdsOf, shopName } from '../database/sheet-records'
