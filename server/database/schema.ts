import { sql } from 'drizzle-orm'
import {
  type AnyPgColumn, bigint, boolean, check, customType, date, doublePrecision, index, integer, jsonb, pgTable, primaryKey, serial, text, timestamp, uniqueIndex,
} from 'drizzle-orm/pg-core'
import type { Role } from '../../shared/utils/roles'
import type { TrialJointKind } from '../../shared/vocabulary/trial-joints'
import type { EquipmentKind, equipmentStates } from '../../shared/vocabulary/equipment-kinds'
import type { MailStatus } from '../../shared/vocabulary/list-filters'

// Lengths are stored in the unit of their record (`unit`: 'in' | 'mm'); the rules evaluate them in that unit.
const created = () => timestamp('created_at', { withTimezone: true }).notNull().defaultNow()
const updated = () => timestamp('updated_at', { withTimezone: true }).notNull().defaultNow()
const unit = () => text('unit').notNull().default('in')
const unitCheck = (name: string, column: unknown) => check(name, sql`${column} in ('in', 'mm')`)

export const welders = pgTable('welders', {
  id: serial('id').primaryKey(),
  name: text('name').notNull(),
  stamp: text('stamp').notNull(),
  employeeNumber: text('employee_number'),
  status: text('status').notNull().default('active'),
  email: text('email'),
  // Secret of the welder's subscribable calendar feed of lapse dates; null until the welder asks for one.
  calendarToken: text('calendar_token'),
  // Secret of the welder's public ID-card page (the QR on the card); null until the shop issues one. A new one revokes the old.
  cardToken: text('card_token'),
  // Whether the public ID-card page answers; the shop turns it off per welder.
  cardPublic: boolean('card_public').notNull().default(false),
  version: integer('version').notNull().default(1),
  createdAt: created(),
  updatedAt: updated(),
}, t => [
  uniqueIndex('welders_stamp_key').on(t.stamp),
  uniqueIndex('welders_calendar_token_key').on(t.calendarToken),
  uniqueIndex('welders_card_token_key').on(t.cardToken),
  index('welders_name_idx').on(t.name),
  check('welders_status_check', sql`${t.status} in ('active', 'inactive')`),
])

export const accounts = pgTable('accounts', {
  id: serial('id').primaryKey(),
  email: text('email').notNull(),
  name: text('name').notNull(),
  role: text('role').notNull().$type<Role>(),
  passwordHash: text('password_hash'),
  welderId: integer('welder_id').references(() => welders.id),
  active: boolean('active').notNull().default(true),
  // Carried in every session token; raising it ends every session of the account (sign out everywhere,
  // password change or reset, role change, deactivation).
  sessionGeneration: integer('session_generation').notNull().default(0),
  createdAt: created(),
}, t => [
  uniqueIndex('accounts_email_key').on(sql`lower(${t.email})`),
  check('accounts_role_check', sql`${t.role} in ('supervisor', 'inspector', 'welder', 'auditor')`),
  // A welder account must point at its roster entry; no other role may.
  check('accounts_welder_link_check', sql`(${t.role} = 'welder') = (${t.welderId} is not null)`),
])

export const baseMetals = pgTable('base_metals', {
  id: serial('id').primaryKey(),
  specification: text('specification').notNull(),
  grade: text('grade').notNull(),
  pNumber: text('p_number').notNull(),
  groupNumber: integer('group_number'),
  // Specified minimum tensile strength, psi (the tensile acceptance of QW-153)
  minTensilePsi: integer('min_tensile_psi'),
}, t => [uniqueIndex('base_metals_spec_grade_key').on(t.specification, t.grade)])

export const fillerMetals = pgTable('filler_metals', {
  id: serial('id').primaryKey(),
  specification: text('specification').notNull(),
  classification: text('classification').notNull(),
  fNumber: text('f_number').notNull(),
  aNumber: text('a_number'),
}, t => [uniqueIndex('filler_metals_spec_class_key').on(t.specification, t.classification)])

export const procedures = pgTable('procedures', {
  id: serial('id').primaryKey(),
  number: text('number').notNull(),
  revision: integer('revision').notNull().default(0),
  title: text('title').notNull(),
  code: text('code').notNull(),
  edition: text('edition').notNull(),
  status: text('status').notNull().default('draft'),
  unit: unit(),
  process: text('process').notNull(),
  transfer: text('transfer'),
  // Searchable ranges; the rest of the variables live in `variables`.
  pNumberA: text('p_number_a'),
  pNumberB: text('p_number_b'),
  thicknessMin: doublePrecision('thickness_min'),
  thicknessMax: doublePrecision('thickness_max'),
  diameterMin: doublePrecision('diameter_min'),
  positions: text('positions').array().notNull().default(sql`'{}'::text[]`),
  fNumbers: text('f_numbers').array().notNull().default(sql`'{}'::text[]`),
  variables: jsonb('variables').notNull().default({}),
  // Every process of the WPS in layer order (searchable: lists and "Who can weld it?"); `process` is the first layer's.
  processes: text('processes').array().notNull().default(sql`'{}'::text[]`),
  // The process layers in order (root, hot pass, fill, cap...), each validated by procedureLayerSchema on write.
  layers: jsonb('layers').notNull().default([]),
  // AWS D1.1: written to the code's prequalification limits, approved without a PQR when the check finds no failure.
  prequalified: boolean('prequalified').notNull().default(false),
  version: integer('version').notNull().default(1),
  createdBy: integer('created_by').references(() => accounts.id),
  approvedAt: timestamp('approved_at', { withTimezone: true }),
  createdAt: created(),
  updatedAt: updated(),
}, t => [
  uniqueIndex('procedures_number_revision_key').on(t.number, t.revision),
  index('procedures_status_idx').on(t.status, t.process),
  index('procedures_processes_idx').using('gin', t.processes),
  check('procedures_layers_check', sql`jsonb_typeof(${t.layers}) = 'array'`),
  check('procedures_status_check', sql`${t.status} in ('draft', 'approved', 'superseded')`),
  check('procedures_code_check', sql`${t.code} in ('asme-ix', 'aws-d1.1', 'aws-d1.3', 'iso-9606-1', 'iso-15614-1')`),
  check('procedures_revision_check', sql`${t.revision} >= 0`),
  check('procedures_thickness_check', sql`${t.thicknessMin} is null or ${t.thicknessMax} is null or ${t.thicknessMin} <= ${t.thicknessMax}`),
  unitCheck('procedures_unit_check', t.unit),
])

export const pqrs = pgTable('pqrs', {
  id: serial('id').primaryKey(),
  number: text('number').notNull(),
  testDate: date('test_date', { mode: 'string' }).notNull(),
  code: text('code').notNull(),
  edition: text('edition').notNull(),
  unit: unit(),
  process: text('process').notNull(),
  transfer: text('transfer'),
  couponThickness: doublePrecision('coupon_thickness').notNull(),
  depositThickness: doublePrecision('deposit_thickness'),
  baseMetalId: integer('base_metal_id').references(() => baseMetals.id),
  fillerMetalId: integer('filler_metal_id').references(() => fillerMetals.id),
  toughnessRequired: boolean('toughness_required').notNull().default(false),
  // The values actually used on the coupon (amps, volts, travel, gas, preheat...)
  actuals: jsonb('actuals').notNull().default({}),
  toughness: jsonb('toughness'),
  labReportNumber: text('lab_report_number'),
  // Base metal B of a dissimilar joint (null: the same as base metal A)
  baseMetalBId: integer('base_metal_b_id').references(() => baseMetals.id),
  // The welder who welded the coupon (ASME IX QW-301.2)
  welderId: integer('welder_id').references(() => welders.id),
  processes: text('processes').array().notNull().default(sql`'{}'::text[]`),
  // The layers as welded: process, filler and the values actually used, with each process's deposit thickness
  layers: jsonb('layers').notNull().default([]),
  status: text('status').notNull().default('recorded'),
  version: integer('version').notNull().default(1),
  createdAt: created(),
  updatedAt: updated(),
}, t => [
  uniqueIndex('pqrs_number_key').on(t.number),
  check('pqrs_layers_check', sql`jsonb_typeof(${t.layers}) = 'array'`),
  check('pqrs_status_check', sql`${t.status} in ('recorded', 'certified', 'failed')`),
  check('pqrs_coupon_check', sql`${t.couponThickness} > 0`),
  unitCheck('pqrs_unit_check', t.unit),
])

export const pqrTensileSpecimens = pgTable('pqr_tensile_specimens', {
  id: serial('id').primaryKey(),
  pqrId: integer('pqr_id').notNull().references(() => pqrs.id, { onDelete: 'cascade' }),
  label: text('label').notNull(),
  width: doublePrecision('width').notNull(),
  thickness: doublePrecision('thickness').notNull(),
  load: doublePrecision('load').notNull(),
  strength: doublePrecision('strength').notNull(),
  breakLocation: text('break_location').notNull(),
  accepted: boolean('accepted').notNull(),
}, t => [
  index('pqr_tensile_pqr_idx').on(t.pqrId),
  check('pqr_tensile_positive_check', sql`${t.width} > 0 and ${t.thickness} > 0 and ${t.load} > 0`),
])

export const pqrBendSpecimens = pgTable('pqr_bend_specimens', {
  id: serial('id').primaryKey(),
  pqrId: integer('pqr_id').notNull().references(() => pqrs.id, { onDelete: 'cascade' }),
  type: text('type').notNull(),
  largestIndication: doublePrecision('largest_indication').notNull().default(0),
  atCorner: boolean('at_corner').notNull().default(false),
  accepted: boolean('accepted').notNull(),
}, t => [
  index('pqr_bend_pqr_idx').on(t.pqrId),
  check('pqr_bend_type_check', sql`${t.type} in ('face', 'root', 'side', 'longitudinal-face', 'longitudinal-root')`),
  check('pqr_bend_indication_check', sql`${t.largestIndication} >= 0`),
])

export const procedurePqrs = pgTable('procedure_pqrs', {
  procedureId: integer('procedure_id').notNull().references(() => procedures.id, { onDelete: 'cascade' }),
  pqrId: integer('pqr_id').notNull().references(() => pqrs.id),
}, t => [primaryKey({ columns: [t.procedureId, t.pqrId] })])

export const welderTests = pgTable('welder_tests', {
  id: serial('id').primaryKey(),
  welderId: integer('welder_id').notNull().references(() => welders.id),
  procedureId: integer('procedure_id').references(() => procedures.id),
  testDate: date('test_date', { mode: 'string' }).notNull(),
  code: text('code').notNull(),
  edition: text('edition').notNull(),
  unit: unit(),
  process: text('process').notNull(),
  transfer: text('transfer'),
  form: text('form').notNull(),
  weld: text('weld').notNull(),
  couponThickness: doublePrecision('coupon_thickness'),
  depositThickness: doublePrecision('deposit_thickness'),
  layers: integer('layers'),
  outsideDiameter: doublePrecision('outside_diameter'),
  pNumber: text('p_number'),
  fNumber: text('f_number'),
  backing: boolean('backing').notNull().default(true),
  positions: text('positions').array().notNull(),
  progression: text('progression'),
  visualAccepted: boolean('visual_accepted'),
  visualNotes: text('visual_notes'),
  examination: text('examination').notNull().default('bend'),
  radiography: jsonb('radiography'),
  // Ranges qualified as computed by shared/rules when the test was last saved
  ranges: jsonb('ranges'),
  // Every process welded on the coupon, in order (`process` is the first); each counts for its own continuity.
  processes: text('processes').array().notNull().default(sql`'{}'::text[]`),
  // Per process: { process, transfer, depositThickness } (ASME IX QW-452.1(b): each process qualifies its own deposit)
  deposits: jsonb('deposits').notNull().default([]),
  // The PQR whose coupon this is, when the test was made from it (QW-301.2)
  pqrId: integer('pqr_id').references(() => pqrs.id),
  // AWS D1.3 joint type of the test (square-groove, flare-groove, fillet, plug, arc-spot, arc-seam); null for other codes.
  jointType: text('joint_type'),
  // ISO 9606-1 only: filler type, weld details, examiner, methods of test, identification, 9.3 route (shared/schemas/welder-test.ts)
  iso: jsonb('iso'),
  // Who the test qualifies: a welder (manual, semi-automatic) or a welding operator (machine, automatic; ASME IX QW-360).
  qualifiedAs: text('qualified_as').notNull().default('welder'),
  // A welding operator's essential variables as tested (shared/schemas/operator.ts); null for a welder.
  operator: jsonb('operator'),
  status: text('status').notNull().default('recorded'),
  inspectorId: integer('inspector_id').references(() => accounts.id),
  certifiedAt: timestamp('certified_at', { withTimezone: true }),
  version: integer('version').notNull().default(1),
  createdAt: created(),
  updatedAt: updated(),
}, t => [
  index('welder_tests_welder_idx').on(t.welderId, t.process),
  index('welder_tests_status_idx').on(t.status, t.testDate),
  check('welder_tests_status_check', sql`${t.status} in ('recorded', 'certified', 'failed')`),
  check('welder_tests_qualified_as_check', sql`${t.qualifiedAs} in ('welder', 'welding-operator')`),
  check('welder_tests_deposits_check', sql`jsonb_typeof(${t.deposits}) = 'array'`),
  check('welder_tests_form_check', sql`${t.form} in ('plate', 'pipe')`),
  check('welder_tests_weld_check', sql`${t.weld} in ('groove', 'fillet')`),
  check('welder_tests_exam_check', sql`${t.examination} in ('bend', 'radiography', 'macro-fracture')`),
  check('welder_tests_sizes_check', sql`coalesce(${t.couponThickness}, 1) > 0 and coalesce(${t.outsideDiameter}, 1) > 0 and coalesce(${t.depositThickness}, 1) > 0`),
  unitCheck('welder_tests_unit_check', t.unit),
])

export const welderTestBends = pgTable('welder_test_bends', {
  id: serial('id').primaryKey(),
  testId: integer('test_id').notNull().references(() => welderTests.id, { onDelete: 'cascade' }),
  type: text('type').notNull(),
  largestIndication: doublePrecision('largest_indication').notNull().default(0),
  atCorner: boolean('at_corner').notNull().default(false),
  accepted: boolean('accepted').notNull(),
}, t => [
  index('welder_test_bends_test_idx').on(t.testId),
  check('welder_test_bends_type_check', sql`${t.type} in ('face', 'root', 'side')`),
  check('welder_test_bends_indication_check', sql`${t.largestIndication} >= 0`),
])

export const continuityEntries = pgTable('continuity_entries', {
  id: serial('id').primaryKey(),
  welderId: integer('welder_id').notNull().references(() => welders.id),
  process: text('process').notNull(),
  weldedOn: date('welded_on', { mode: 'string' }).notNull(),
  reference: text('reference').notNull(),
  recordedBy: integer('recorded_by').references(() => accounts.id),
  // The production joint whose welding this use is (posted when the joint was marked welded); null for entries typed in.
  jointId: integer('joint_id').references((): AnyPgColumn => joints.id, { onDelete: 'set null' }),
  createdAt: created(),
  // The CSV import that stored this entry (null: logged by hand); an import is undone as a whole (continuity_imports).
  importId: integer('import_id').references((): AnyPgColumn => continuityImports.id),
}, t => [
  index('continuity_joint_idx').on(t.jointId),
  index('continuity_welder_process_idx').on(t.welderId, t.process, t.weldedOn),
  index('continuity_date_idx').on(t.weldedOn),
])

export const customers = pgTable('customers', {
  id: serial('id').primaryKey(),
  name: text('name').notNull(),
  contact: text('contact'),
  version: integer('version').notNull().default(1),
  createdAt: created(),
}, t => [uniqueIndex('customers_name_key').on(t.name)])

export const projects = pgTable('projects', {
  id: serial('id').primaryKey(),
  customerId: integer('customer_id').notNull().references(() => customers.id),
  number: text('number').notNull(),
  name: text('name').notNull(),
  startsOn: date('starts_on', { mode: 'string' }).notNull(),
  endsOn: date('ends_on', { mode: 'string' }),
  version: integer('version').notNull().default(1),
  createdAt: created(),
}, t => [
  uniqueIndex('projects_number_key').on(t.number),
  check('projects_period_check', sql`${t.endsOn} is null or ${t.endsOn} >= ${t.startsOn}`),
])

export const projectProcedures = pgTable('project_procedures', {
  projectId: integer('project_id').notNull().references(() => projects.id, { onDelete: 'cascade' }),
  procedureId: integer('procedure_id').notNull().references(() => procedures.id),
}, t => [primaryKey({ columns: [t.projectId, t.procedureId] })])

export const projectWelders = pgTable('project_welders', {
  projectId: integer('project_id').notNull().references(() => projects.id, { onDelete: 'cascade' }),
  welderId: integer('welder_id').notNull().references(() => welders.id),
}, t => [primaryKey({ columns: [t.projectId, t.welderId] })])

export const auditorGrants = pgTable('auditor_grants', {
  accountId: integer('account_id').notNull().references(() => accounts.id, { onDelete: 'cascade' }),
  projectId: integer('project_id').notNull().references(() => projects.id, { onDelete: 'cascade' }),
  grantedAt: created(),
}, t => [primaryKey({ columns: [t.accountId, t.projectId] })])

export const packets = pgTable('packets', {
  id: serial('id').primaryKey(),
  projectId: integer('project_id').notNull().references(() => projects.id),
  requestedBy: integer('requested_by').references(() => accounts.id),
  status: text('status').notNull().default('queued'),
  progress: integer('progress').notNull().default(0),
  pageCount: integer('page_count'),
  storageKey: text('storage_key'),
  sha256: text('sha256'),
  error: text('error'),
  createdAt: created(),
  // Touched as a build progresses; a build not touched for minutes was interrupted (its process stopped).
  updatedAt: updated(),
}, t => [check('packets_status_check', sql`${t.status} in ('queued', 'building', 'ready', 'failed')`)])

export const signatures = pgTable('signatures', {
  id: serial('id').primaryKey(),
  recordType: text('record_type').notNull(),
  recordId: integer('record_id').notNull(),
  recordVersion: integer('record_version').notNull(),
  signerId: integer('signer_id').notNull().references(() => accounts.id),
  signerName: text('signer_name').notNull(),
  meaning: text('meaning').notNull(),
  signedAt: timestamp('signed_at', { withTimezone: true }).notNull().defaultNow(),
  sha256: text('sha256').notNull(),
  // Short code printed beside the QR code; the public verification page looks it up.
  verifyCode: text('verify_code').notNull(),
  // Which fields the hash covers (server/database/signing.ts): 1 before process layers, 2 with them
  contentFormat: integer('content_format').notNull().default(1),
}, t => [
  check('signatures_content_format_check', sql`${t.contentFormat} in (1, 2, 3)`),
  uniqueIndex('signatures_verify_code_key').on(t.verifyCode),
  index('signatures_record_idx').on(t.recordType, t.recordId),
  check('signatures_meaning_check', sql`${t.meaning} in ('prepared', 'witnessed', 'approved', 'certified')`),
  check('signatures_record_type_check', sql`${t.recordType} in ('procedure', 'pqr', 'welder-test')`),
  check('signatures_sha_check', sql`${t.sha256} ~ '^[0-9a-f]{64}$'`),
])

export const attachments = pgTable('attachments', {
  id: serial('id').primaryKey(),
  recordType: text('record_type').notNull(),
  recordId: integer('record_id').notNull(),
  fileName: text('file_name').notNull(),
  contentType: text('content_type').notNull(),
  size: integer('size').notNull(),
  sha256: text('sha256').notNull(),
  storageKey: text('storage_key').notNull(),
  // What the file is to its record: lab report, radiography report, coupon photo, joint sketch, mill test report...
  kind: text('kind').notNull().default('other'),
  uploadedBy: integer('uploaded_by').references(() => accounts.id),
  createdAt: created(),
}, t => [
  index('attachments_record_idx').on(t.recordType, t.recordId),
  check('attachments_size_check', sql`${t.size} > 0`),
])

export const readings = pgTable('readings', {
  id: serial('id').primaryKey(),
  procedureId: integer('procedure_id').notNull().references(() => procedures.id),
  welderId: integer('welder_id').references(() => welders.id),
  takenAt: timestamp('taken_at', { withTimezone: true }).notNull().defaultNow(),
  values: jsonb('values').notNull(),
  outOfWindow: boolean('out_of_window').notNull(),
  // Taken with a machine or meter out of calibration that day, or whose calibration Rootface cannot tell (reading_equipment).
  calibrationFlag: boolean('calibration_flag').notNull().default(false),
  recordedBy: integer('recorded_by').references(() => accounts.id),
}, t => [index('readings_procedure_idx').on(t.procedureId, t.takenAt)])

export const auditEvents = pgTable('audit_events', {
  id: serial('id').primaryKey(),
  accountId: integer('account_id').references(() => accounts.id),
  action: text('action').notNull(),
  recordType: text('record_type').notNull(),
  recordId: integer('record_id'),
  before: jsonb('before'),
  after: jsonb('after'),
  at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
}, t => [index('audit_events_record_idx').on(t.recordType, t.recordId, t.at)])

export const shopSettings = pgTable('shop_settings', {
  id: integer('id').primaryKey().default(1),
  name: text('name').notNull(),
  // Whether welders may log their own continuity (DESIGN.md: "only if the shop allows it")
  welderLogsOwnContinuity: boolean('welder_logs_own_continuity').notNull().default(false),
  // Whether welders may record trial runs at the machine (issue 23: supervisor and inspector always may)
  welderRecordsTrials: boolean('welder_records_trials').notNull().default(false),
  updatedAt: updated(),
}, t => [check('shop_settings_single_row_check', sql`${t.id} = 1`)])

export const signoffRequests = pgTable('signoff_requests', {
  id: serial('id').primaryKey(),
  recordType: text('record_type').notNull(),
  recordId: integer('record_id').notNull(),
  // What is asked: an inspector to certify, or a supervisor to approve
  meaning: text('meaning').notNull().$type<'approved' | 'certified' | 'witnessed'>(),
  requestedBy: integer('requested_by').notNull().references(() => accounts.id),
  requestedOf: integer('requested_of').references(() => accounts.id),
  note: text('note'),
  status: text('status').notNull().default('open'),
  createdAt: created(),
  resolvedAt: timestamp('resolved_at', { withTimezone: true }),
}, t => [
  index('signoff_requests_open_idx').on(t.status, t.requestedOf),
  check('signoff_requests_status_check', sql`${t.status} in ('open', 'done', 'withdrawn')`),
  check('signoff_requests_meaning_check', sql`${t.meaning} in ('approved', 'certified', 'witnessed')`),
])

export const accountTokens = pgTable('account_tokens', {
  id: serial('id').primaryKey(),
  accountId: integer('account_id').notNull().references(() => accounts.id, { onDelete: 'cascade' }),
  purpose: text('purpose').notNull(),
  // Only the SHA-256 of the token is stored; the token itself is in the link sent by e-mail.
  tokenHash: text('token_hash').notNull(),
  expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
  usedAt: timestamp('used_at', { withTimezone: true }),
  createdAt: created(),
}, t => [
  uniqueIndex('account_tokens_hash_key').on(t.tokenHash),
  check('account_tokens_purpose_check', sql`${t.purpose} in ('invitation', 'password-reset')`),
])

export const mailMessages = pgTable('mail_messages', {
  id: serial('id').primaryKey(),
  // One key per message that must go out once (e.g. 'lapse:12:GMAW:2027-01-15:14'); a re-run finds it and skips.
  dedupeKey: text('dedupe_key').notNull(),
  kind: text('kind').notNull(),
  to: text('to').notNull(),
  subject: text('subject').notNull(),
  text: text('text').notNull(),
  html: text('html').notNull(),
  status: text('status').$type<MailStatus>().notNull().default('queued'),
  attempts: integer('attempts').notNull().default(0),
  lastError: text('last_error'),
  // A send claims the row until then; after a failure it is the earliest time of the next attempt.
  notBefore: timestamp('not_before', { withTimezone: true }),
  sentAt: timestamp('sent_at', { withTimezone: true }),
  createdAt: created(),
}, t => [
  uniqueIndex('mail_messages_dedupe_key').on(t.dedupeKey),
  index('mail_messages_status_idx').on(t.status, t.createdAt),
  check('mail_messages_status_check', sql`${t.status} in ('queued', 'sent', 'failed')`),
])

// The PDF of a finished packet, kept in the database so every app server behind a balancer can hand it out.
const bytea = customType<{ data: Uint8Array, driverData: Uint8Array }>({ dataType: () => 'bytea' })
export const packetFiles = pgTable('packet_files', {
  packetId: integer('packet_id').primaryKey().references(() => packets.id, { onDelete: 'cascade' }),
  content: bytea('content').notNull(),
})

// Documents that are issued rather than signed: a welder's continuity log for a period, a project's weld register as
// its packet prints it. The hash of the content as printed and the code of its QR, so the verification page can tell
// whether the document has changed since. One table for every kind (the weld register moved here from its own table).
export const issuedSheets = pgTable('issued_sheets', {
  id: serial('id').primaryKey(),
  kind: text('kind').notNull(),
  welderId: integer('welder_id').references(() => welders.id),
  periodFrom: date('period_from', { mode: 'string' }),
  periodTo: date('period_to', { mode: 'string' }),
  projectId: integer('project_id').references(() => projects.id, { onDelete: 'cascade' }),
  sha256: text('sha256').notNull(),
  verifyCode: text('verify_code').notNull(),
  issuedBy: integer('issued_by').references(() => accounts.id),
  issuerName: text('issuer_name').notNull(),
  issuedAt: timestamp('issued_at', { withTimezone: true }).notNull().defaultNow(),
}, t => [
  uniqueIndex('issued_sheets_verify_code_key').on(t.verifyCode),
  index('issued_sheets_subject_idx').on(t.kind, t.welderId, t.periodFrom, t.periodTo, t.sha256),
  index('issued_sheets_project_idx').on(t.kind, t.projectId, t.sha256),
  check('issued_sheets_kind_check', sql`${t.kind} in ('continuity-log', 'weld-register')`),
  // What each kind is issued for: a continuity log names its welder and period, a weld register its project.
  check('issued_sheets_subject_check', sql`(${t.kind} = 'continuity-log' and ${t.welderId} is not null and ${t.periodFrom} is not null and ${t.periodTo} is not null)
    or (${t.kind} = 'weld-register' and ${t.projectId} is not null)`),
  check('issued_sheets_sha_check', sql`${t.sha256} ~ '^[0-9a-f]{64}$'`),
])

// Where each welder stands per process, kept from the continuity chain (shared/qualification/process-standing.ts).
// Triggers on welder_tests and continuity_entries mark a welder × process in standing_refresh; the next read recomputes it.
export const processStandings = pgTable('process_standings', {
  welderId: integer('welder_id').notNull().references(() => welders.id, { onDelete: 'cascade' }),
  process: text('process').notNull(),
  code: text('code').notNull(),
  edition: text('edition').notNull(),
  testDate: date('test_date', { mode: 'string' }).notNull(),
  lastUse: date('last_use', { mode: 'string' }).notNull(),
  lapsesOn: date('lapses_on', { mode: 'string' }).notNull(),
  rule: text('rule').notNull(),
  // Set while a revocation holds (qualification_revocations): lapses_on is then the revocation day.
  revokedOn: date('revoked_on', { mode: 'string' }),
  revokedReason: text('revoked_reason'),
  revokedBy: text('revoked_by'),
}, t => [
  primaryKey({ columns: [t.welderId, t.process] }),
  index('process_standings_lapses_idx').on(t.lapsesOn),
])

export const standingRefresh = pgTable('standing_refresh', {
  welderId: integer('welder_id').notNull(),
  process: text('process').notNull(),
}, t => [primaryKey({ columns: [t.welderId, t.process] })])

// Failed sign-ins per key ('account:<e-mail>' or 'address:<client address>'), kept in the database so every app
// server sees the same counts and a restart does not reset them (server/utils/sign-in-throttle.ts).
export const signInFailures = pgTable('sign_in_failures', {
  key: text('key').primaryKey(),
  failures: integer('failures').notNull().default(0),
  lastFailureAt: timestamp('last_failure_at', { withTimezone: true }).notNull().defaultNow(),
  // Set when the failures reach the lock threshold; sign-in for this key is refused (429) until then.
  lockedUntil: timestamp('locked_until', { withTimezone: true }),
}, t => [
  index('sign_in_failures_last_idx').on(t.lastFailureAt),
  check('sign_in_failures_count_check', sql`${t.failures} >= 0`),
])

// ---- tidy ----
// One committed CSV import of continuity entries: who stored how many rows when, and whether (and by whom) it was undone.
export const continuityImports = pgTable('continuity_imports', {
  id: serial('id').primaryKey(),
  importedBy: integer('imported_by').references(() => accounts.id),
  rows: integer('rows').notNull(),
  createdAt: created(),
  undoneAt: timestamp('undone_at', { withTimezone: true }),
  undoneBy: integer('undone_by').references(() => accounts.id),
}, t => [index('continuity_imports_created_idx').on(t.createdAt)])
// ---- end tidy ----
// ---- iso ----
// ISO 9606-1 validity of a certified test: the six-monthly confirmations of clause 9.2 and the 9.3 b) records of
// production welds tested. Each is signed by its author (sha256 over its content) and never edited.
export const isoValidityRecords = pgTable('iso_validity_records', {
  id: serial('id').primaryKey(),
  testId: integer('test_id').notNull().references(() => welderTests.id),
  kind: text('kind').notNull(),
  on: date('on', { mode: 'string' }).notNull(),
  confirmer: text('confirmer').notNull(),
  statement: text('statement').notNull(),
  reference: text('reference'),
  signerId: integer('signer_id').notNull().references(() => accounts.id),
  signerName: text('signer_name').notNull(),
  sha256: text('sha256').notNull(),
  createdAt: created(),
}, t => [
  index('iso_validity_records_test_idx').on(t.testId, t.on),
  check('iso_validity_records_kind_check', sql`${t.kind} in ('confirmation', 'production-welds')`),
  check('iso_validity_records_confirmer_check', sql`${t.confirmer} in ('coordinator', 'examiner')`),
])
// ---- end iso ----
// ---- trials ----
// Trial runs at the machine: a series (what is welded with what) and its beads (settings tried, how each came out).
// Lengths and speeds in the series' unit (in: in, in/min, ft³/h; mm: mm, mm/min, L/min).
export const trialSeries = pgTable('trial_series', {
  id: serial('id').primaryKey(),
  title: text('title').notNull(),
  unit: unit(),
  process: text('process').notNull(),
  transfer: text('transfer'),
  wireClass: text('wire_class').notNull(),
  wireDiameter: doublePrecision('wire_diameter').notNull(),
  fillerMetalId: integer('filler_metal_id').references(() => fillerMetals.id),
  gas: text('gas'),
  gasFlow: doublePrecision('gas_flow'),
  baseMetal: text('base_metal').notNull(),
  baseMetalId: integer('base_metal_id').references(() => baseMetals.id),
  thickness: doublePrecision('thickness').notNull(),
  gauge: text('gauge'),
  joint: text('joint').notNull().$type<TrialJointKind>(),
  rootGap: doublePrecision('root_gap'),
  position: text('position').notNull(),
  progression: text('progression'),
  notes: text('notes'),
  // The PQR proposed from the accepted beads, and the WPS proposed once it was certified
  pqrId: integer('pqr_id').references(() => pqrs.id),
  procedureId: integer('procedure_id').references(() => procedures.id),
  createdBy: integer('created_by').references(() => accounts.id),
  version: integer('version').notNull().default(1),
  createdAt: created(),
  updatedAt: updated(),
}, t => [
  index('trial_series_updated_idx').on(t.updatedAt),
  check('trial_series_sizes_check', sql`${t.wireDiameter} > 0 and ${t.thickness} > 0`),
  unitCheck('trial_series_unit_check', t.unit),
])

export const trialBeads = pgTable('trial_beads', {
  id: serial('id').primaryKey(),
  seriesId: integer('series_id').notNull().references(() => trialSeries.id, { onDelete: 'cascade' }),
  number: integer('number').notNull(),
  volts: doublePrecision('volts').notNull(),
  wireFeed: doublePrecision('wire_feed').notNull(),
  amps: doublePrecision('amps'),
  ctwd: doublePrecision('ctwd'),
  travelSpeed: doublePrecision('travel_speed'),
  beadLength: doublePrecision('bead_length'),
  arcTime: doublePrecision('arc_time'),
  energy: doublePrecision('energy'),
  power: doublePrecision('power'),
  gasFlow: doublePrecision('gas_flow'),
  wetting: text('wetting'),
  spatter: text('spatter'),
  arcSound: text('arc_sound'),
  porosity: boolean('porosity').notNull().default(false),
  undercut: boolean('undercut').notNull().default(false),
  meltThrough: boolean('melt_through').notNull().default(false),
  lackOfFusion: boolean('lack_of_fusion').notNull().default(false),
  backPenetration: text('back_penetration'),
  notes: text('notes'),
  recordedBy: integer('recorded_by').references(() => accounts.id),
  createdAt: created(),
}, t => [
  uniqueIndex('trial_beads_series_number_key').on(t.seriesId, t.number),
  check('trial_beads_settings_check', sql`${t.volts} > 0 and ${t.wireFeed} > 0`),
])

// The shop's table of starting settings per process, wire diameter, thickness or gauge and gas; `source` says where
// each row comes from (common practice, a public source, the shop's own trials).
export const trialStartingPoints = pgTable('trial_starting_points', {
  id: serial('id').primaryKey(),
  unit: unit(),
  process: text('process').notNull(),
  transfer: text('transfer'),
  wireDiameter: doublePrecision('wire_diameter').notNull(),
  thickness: doublePrecision('thickness').notNull(),
  gauge: text('gauge'),
  gas: text('gas'),
  volts: doublePrecision('volts').notNull(),
  wireFeed: doublePrecision('wire_feed').notNull(),
  amps: doublePrecision('amps'),
  ctwd: doublePrecision('ctwd'),
  travelSpeed: doublePrecision('travel_speed'),
  source: text('source').notNull(),
  createdAt: created(),
}, t => [
  index('trial_starting_points_process_idx').on(t.process),
  unitCheck('trial_starting_points_unit_check', t.unit),
])
// ---- end trials ----
// ---- quality-a ----
// A welder × process qualification revoked for a specific reason (ASME IX QW-322.1(b)). Its own record: the certified
// tests stay as signed; a trigger marks the welder × process in standing_refresh, and a new certified test dated on
// or after the revocation day restores it (QW-322.2(b), shared/qualification/revocation.ts).
export const qualificationRevocations = pgTable('qualification_revocations', {
  id: serial('id').primaryKey(),
  welderId: integer('welder_id').notNull().references(() => welders.id),
  process: text('process').notNull(),
  revokedOn: date('revoked_on', { mode: 'string' }).notNull(),
  reason: text('reason').notNull(),
  revokedBy: integer('revoked_by').notNull().references(() => accounts.id),
  basisTestId: integer('basis_test_id').references(() => welderTests.id),
  createdAt: created(),
}, t => [
  index('qualification_revocations_welder_idx').on(t.welderId, t.process),
  check('qualification_revocations_reason_check', sql`length(trim(${t.reason})) > 0`),
])
// ---- end quality-a ----

// ---- quality-b ----
// Welding machines and the meters used to set and check them, each with its calibration (date, interval, certificate
// as an attachment of record type 'equipment').
export const equipment = pgTable('equipment', {
  id: serial('id').primaryKey(),
  kind: text('kind').notNull().$type<EquipmentKind>(),
  // The shop's own tag for it (asset number), unique.
  tag: text('tag').notNull(),
  description: text('description'),
  serialNumber: text('serial_number'),
  state: text('state').notNull().default('in-service').$type<typeof equipmentStates[number]>(),
  calibratedOn: date('calibrated_on', { mode: 'string' }),
  intervalMonths: integer('interval_months'),
  notes: text('notes'),
  version: integer('version').notNull().default(1),
  createdAt: created(),
  updatedAt: updated(),
}, t => [
  uniqueIndex('equipment_tag_key').on(t.tag),
  check('equipment_kind_check', sql`${t.kind} in ('welding-machine', 'ammeter', 'voltmeter', 'wire-feed-speed-meter', 'gas-flow-meter', 'temperature-indicator')`),
  check('equipment_state_check', sql`${t.state} in ('in-service', 'out-of-service')`),
  check('equipment_interval_check', sql`${t.intervalMonths} is null or ${t.intervalMonths} between 1 and 120`),
])

// The machine and meters a production reading was taken with, and where each one's calibration stood that day.
export const readingEquipment = pgTable('reading_equipment', {
  readingId: integer('reading_id').notNull().references(() => readings.id, { onDelete: 'cascade' }),
  equipmentId: integer('equipment_id').notNull().references(() => equipment.id),
  calibrationState: text('calibration_state').notNull(),
  dueOn: date('due_on', { mode: 'string' }),
}, t => [
  primaryKey({ columns: [t.readingId, t.equipmentId] }),
  index('reading_equipment_equipment_idx').on(t.equipmentId),
])

// Welder test history brought in from a shop's own records: the ranges exactly as recorded there, kept "imported, not
// recomputed" (no rule has looked at them) until an inspector confirms them against the original. Once confirmed a
// test keeps the standing of its process (process_standings) like a certified test; never before. Coverage stays with
// the tests recorded in Rootface (the imported ranges are text, not computed).
export const importedTests = pgTable('imported_tests', {
  id: serial('id').primaryKey(),
  welderId: integer('welder_id').notNull().references(() => welders.id),
  code: text('code').notNull(),
  edition: text('edition'),
  process: text('process').notNull(),
  testDate: date('test_date', { mode: 'string' }).notNull(),
  positions: text('positions'),
  thickness: text('thickness'),
  diameter: text('diameter'),
  otherRanges: text('other_ranges'),
  reference: text('reference'),
  state: text('state').notNull().default('imported'),
  importedBy: integer('imported_by').references(() => accounts.id),
  importedAt: timestamp('imported_at', { withTimezone: true }).notNull().defaultNow(),
  confirmedBy: integer('confirmed_by').references(() => accounts.id),
  confirmedAt: timestamp('confirmed_at', { withTimezone: true }),
}, t => [
  index('imported_tests_welder_idx').on(t.welderId, t.testDate),
  check('imported_tests_state_check', sql`${t.state} in ('imported', 'confirmed')`),
])

// The headers of a shop's existing WPSs and PQRs brought in from its register (number, revision, title, code, processes),
// as recorded: a list of what exists on paper until each is entered in full. Nothing is checked against the code.
export const importedDocuments = pgTable('imported_documents', {
  id: serial('id').primaryKey(),
  kind: text('kind').notNull(),
  number: text('number').notNull(),
  revision: text('revision').notNull().default(''),
  title: text('title'),
  code: text('code').notNull(),
  edition: text('edition'),
  processes: text('processes'),
  documentDate: date('document_date', { mode: 'string' }),
  status: text('status'),
  importedBy: integer('imported_by').references(() => accounts.id),
  importedAt: timestamp('imported_at', { withTimezone: true }).notNull().defaultNow(),
}, t => [
  uniqueIndex('imported_documents_number_key').on(t.kind, t.number, t.revision),
  check('imported_documents_kind_check', sql`${t.kind} in ('wps', 'pqr')`),
])
// ---- end quality-b ----

// ---- weld-log ----
// The project's register of production weld joints: what each joint is, the WPS it is welded to, who welded which
// process or layer, when, and how it was examined and repaired. Lengths in the joint's `unit`.
export const joints = pgTable('joints', {
  id: serial('id').primaryKey(),
  projectId: integer('project_id').notNull().references(() => projects.id, { onDelete: 'cascade' }),
  // The shop's own mark: drawing / line / weld number
  mark: text('mark').notNull(),
  jointType: text('joint_type').notNull(),
  weld: text('weld').notNull().default('groove'),
  unit: unit(),
  pNumberA: text('p_number_a'),
  pNumberB: text('p_number_b'),
  thickness: doublePrecision('thickness'),
  outsideDiameter: doublePrecision('outside_diameter'),
  positions: text('positions').array().notNull().default(sql`'{}'::text[]`),
  progression: text('progression'),
  backing: boolean('backing'),
  // Required examinations: visual always; RT and UT as a percentage of joints, MT and PT yes or no
  rtPercent: integer('rt_percent').notNull().default(0),
  utPercent: integer('ut_percent').notNull().default(0),
  mt: boolean('mt').notNull().default(false),
  pt: boolean('pt').notNull().default(false),
  procedureId: integer('procedure_id').references(() => procedures.id),
  weldedOn: date('welded_on', { mode: 'string' }),
  // The check as made when the joint was marked welded: per welder and process the answer and the lapse date on that day
  completionCheck: jsonb('completion_check'),
  version: integer('version').notNull().default(1),
  createdBy: integer('created_by').references(() => accounts.id),
  createdAt: created(),
  updatedAt: updated(),
}, t => [
  uniqueIndex('joints_project_mark_key').on(t.projectId, t.mark),
  index('joints_project_welded_idx').on(t.projectId, t.weldedOn),
  index('joints_procedure_idx').on(t.procedureId),
  check('joints_weld_check', sql`${t.weld} in ('groove', 'fillet')`),
  check('joints_percent_check', sql`${t.rtPercent} between 0 and 100 and ${t.utPercent} between 0 and 100`),
  check('joints_sizes_check', sql`coalesce(${t.thickness}, 1) > 0 and coalesce(${t.outsideDiameter}, 1) > 0`),
  unitCheck('joints_unit_check', t.unit),
])

// Who welded a joint: one row per welder × process (and layer); `repair` 0 is the original weld, 1 is R1, 2 is R2...
export const jointWelders = pgTable('joint_welders', {
  id: serial('id').primaryKey(),
  jointId: integer('joint_id').notNull().references(() => joints.id, { onDelete: 'cascade' }),
  welderId: integer('welder_id').notNull().references(() => welders.id),
  process: text('process').notNull(),
  layer: text('layer'),
  // The filler's F-No. this welder used for this process (a GTAW root and SMAW fill joint has one per process)
  fNumber: integer('f_number'),
  repair: integer('repair').notNull().default(0),
}, t => [
  index('joint_welders_joint_idx').on(t.jointId, t.repair),
  index('joint_welders_welder_idx').on(t.welderId),
  check('joint_welders_repair_check', sql`${t.repair} between 0 and 9`),
])

// Repairs of a joint, R1, R2...: the date the repair was welded (its welders are joint_welders with this `repair`).
export const jointRepairs = pgTable('joint_repairs', {
  id: serial('id').primaryKey(),
  jointId: integer('joint_id').notNull().references(() => joints.id, { onDelete: 'cascade' }),
  repair: integer('repair').notNull(),
  cause: text('cause').notNull(),
  weldedOn: date('welded_on', { mode: 'string' }),
  createdAt: created(),
}, t => [
  uniqueIndex('joint_repairs_key').on(t.jointId, t.repair),
  check('joint_repairs_repair_check', sql`${t.repair} between 1 and 9`),
])

// Examination results of a joint (of its original weld, `repair` 0, or of a repair).
export const jointExaminations = pgTable('joint_examinations', {
  id: serial('id').primaryKey(),
  jointId: integer('joint_id').notNull().references(() => joints.id, { onDelete: 'cascade' }),
  repair: integer('repair').notNull().default(0),
  method: text('method').notNull(),
  reportNumber: text('report_number'),
  examinedOn: date('examined_on', { mode: 'string' }).notNull(),
  accepted: boolean('accepted').notNull(),
  // RT and UT: the length of weld examined, and of a rejected indication its type and length (in the joint's unit)
  lengthExamined: doublePrecision('length_examined'),
  defectType: text('defect_type'),
  defectLength: doublePrecision('defect_length'),
  recordedBy: integer('recorded_by').references(() => accounts.id),
  createdAt: created(),
}, t => [
  index('joint_examinations_joint_idx').on(t.jointId, t.examinedOn),
  check('joint_examinations_method_check', sql`${t.method} in ('VT', 'RT', 'UT', 'MT', 'PT')`),
  check('joint_examinations_lengths_check', sql`coalesce(${t.lengthExamined}, 1) > 0 and coalesce(${t.defectLength}, 0) >= 0`),
])

// A refused check let through by a supervisor: the reasons refused, the written reason, who and when (printed in the packet).
export const jointOverrides = pgTable('joint_overrides', {
  id: serial('id').primaryKey(),
  jointId: integer('joint_id').notNull().references(() => joints.id, { onDelete: 'cascade' }),
  stage: text('stage').notNull(),
  reason: text('reason').notNull(),
  refusals: jsonb('refusals').notNull().default([]),
  accountId: integer('account_id').notNull().references(() => accounts.id),
  accountName: text('account_name').notNull(),
  at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
}, t => [
  index('joint_overrides_joint_idx').on(t.jointId),
  check('joint_overrides_stage_check', sql`${t.stage} in ('assignment', 'completion', 'repair')`),
])

// Per-shop API tokens for other shop systems: only the SHA-256 is stored; scoped; a fixed one-minute window counts uses.
export const apiTokens = pgTable('api_tokens', {
  id: serial('id').primaryKey(),
  name: text('name').notNull(),
  tokenHash: text('token_hash').notNull(),
  // The first characters of the token, shown so a supervisor can tell tokens apart
  prefix: text('prefix').notNull(),
  scopes: text('scopes').array().notNull(),
  createdBy: integer('created_by').notNull().references(() => accounts.id),
  createdAt: created(),
  revokedAt: timestamp('revoked_at', { withTimezone: true }),
  lastUsedAt: timestamp('last_used_at', { withTimezone: true }),
  windowStart: timestamp('window_start', { withTimezone: true }).notNull().defaultNow(),
  windowCount: integer('window_count').notNull().default(0),
}, t => [uniqueIndex('api_tokens_hash_key').on(t.tokenHash)])

// ---- end weld-log ----

// ---- perf ----
// What each certified welder test qualifies per process, derived from the rules' own ranges output
// (shared/qualification/qualified-ranges.ts) and stamped with the rules version that derived it. A trigger on
// welder_tests marks a test in qualified_ranges_refresh; the next read (and start-up, for a new rules version)
// derives it again. "Who can weld it?" filters on these columns in SQL, then runs the rules on the survivors.
// Lengths are micro-units of the test's unit (the rules compare in them exactly).
export const qualifiedRanges = pgTable('qualified_ranges', {
  testId: integer('test_id').notNull().references(() => welderTests.id, { onDelete: 'cascade' }),
  process: text('process').notNull(),
  welderId: integer('welder_id').notNull(),
  code: text('code').notNull(),
  edition: text('edition').notNull(),
  unit: unit(),
  rulesVersion: integer('rules_version').notNull(),
  // False when the rules could not derive the ranges: the test then stays a candidate for every joint.
  derived: boolean('derived').notNull(),
  weld: text('weld').notNull(),
  positionsGroove: text('positions_groove').array(),
  positionsGroovePipe: text('positions_groove_pipe').array(),
  positionsFillet: text('positions_fillet').array(),
  depositMaxMicro: bigint('deposit_max_micro', { mode: 'number' }),
  thicknessMinMicro: bigint('thickness_min_micro', { mode: 'number' }),
  thicknessMaxMicro: bigint('thickness_max_micro', { mode: 'number' }),
  diameterMinMicro: bigint('diameter_min_micro', { mode: 'number' }),
  fNumbers: integer('f_numbers').array(),
  fWithoutBacking: boolean('f_without_backing'),
  backing: boolean('backing'),
  transfer: text('transfer'),
  progression: text('progression'),
  // The digest of the coupon as the covers rule reads it (qualified_coupons): "Who can weld it?" judges each distinct
  // coupon once and grades the welders by it in SQL.
  inputKey: text('input_key'),
  testDate: date('test_date', { mode: 'string' }),
  qualifiedAs: text('qualified_as'),
}, t => [
  primaryKey({ columns: [t.testId, t.process] }),
  index('qualified_ranges_process_idx').on(t.process, t.welderId),
  index('qualified_ranges_rules_idx').on(t.rulesVersion),
])

export const qualifiedRangesRefresh = pgTable('qualified_ranges_refresh', {
  testId: integer('test_id').primaryKey(),
})

// Each distinct coupon once (the code, edition and unit with the rules input of coverageTestInput), under the digest that
// qualified_ranges.input_key names. Content-addressed: a row never changes; rows no test names any more are harmless.
export const qualifiedCoupons = pgTable('qualified_coupons', {
  inputKey: text('input_key').primaryKey(),
  code: text('code').notNull(),
  edition: text('edition').notNull(),
  unit: unit(),
  input: jsonb('input').notNull(),
})
// ---- end perf ----

// ---- weldlog ----
// issued_registers is folded into issued_sheets (kind 'weld-register', project_id): no table of its own.
// ---- end weldlog ----
