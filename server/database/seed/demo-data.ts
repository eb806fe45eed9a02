// The demo shop: an invented fabricator, invented welders and invented jobs. Demo only; never an expected value in a test.
// Dates are offsets in days before the day the demo is seeded, so the picture (current, lapsing soon, lapsed) stays the same.

export const demoShopName = 'Kestrel Bend Fabrication'
export const demoPassword = 'rootface-demo'

export const demoAccounts = [
  { email: 'supervisor@demo.rootface.test', name: 'Maren Oduya', role: 'supervisor' },
  { email: 'inspector@demo.rootface.test', name: 'Tobias Lindqvist-Hale', role: 'inspector' },
  { email: 'welder@demo.rootface.test', name: 'Ines Carvalho', role: 'welder', welderStamp: 'KB-03' },
  { email: 'auditor@demo.rootface.test', name: 'Priya Ramanathan', role: 'auditor', grantedProject: 'KB-2611' },
] as const

export const demoWelders = [
  { stamp: 'KB-01', name: 'Dmitri Ashcombe', employeeNumber: 'E-1041', email: 'd.ashcombe@kestrelbend.test' },
  { stamp: 'KB-02', name: 'Rosalind Mbeki', employeeNumber: 'E-1047', email: 'r.mbeki@kestrelbend.test' },
  { stamp: 'KB-03', name: 'Ines Carvalho', employeeNumber: 'E-1052', email: 'welder@demo.rootface.test' },
  { stamp: 'KB-04', name: 'Owen Tremblay', employeeNumber: 'E-1063', email: 'o.tremblay@kestrelbend.test' },
  { stamp: 'KB-05', name: 'Hana Kowalczyk', employeeNumber: 'E-1070', email: 'h.kowalczyk@kestrelbend.test' },
  { stamp: 'KB-06', name: 'Samuel Adeyemi', employeeNumber: 'E-1078', email: 's.adeyemi@kestrelbend.test' },
  { stamp: 'KB-07', name: 'Lucía Ferreyra', employeeNumber: 'E-1085', email: 'l.ferreyra@kestrelbend.test' },
  { stamp: 'KB-08', name: 'Björn Østergaard', employeeNumber: 'E-1091', email: 'b.ostergaard@kestrelbend.test' },
  { stamp: 'KB-09', name: 'Camille Desrosiers', employeeNumber: 'E-1102', email: 'c.desrosiers@kestrelbend.test' },
  { stamp: 'KB-10', name: 'Tariq Haddad', employeeNumber: 'E-1110', email: 't.haddad@kestrelbend.test' },
  { stamp: 'KB-11', name: 'Wen Zhao', employeeNumber: 'E-1116', email: 'w.zhao@kestrelbend.test' },
  { stamp: 'KB-12', name: 'Fergus McAllister', employeeNumber: 'E-1123', email: 'f.mcallister@kestrelbend.test', status: 'inactive' },
] as const

export const demoBaseMetals = [
  { specification: 'SA-36', grade: '—', pNumber: '1', groupNumber: 1, minTensilePsi: 58000 },
  { specification: 'SA-516', grade: '70', pNumber: '1', groupNumber: 2, minTensilePsi: 70000 },
  { specification: 'SA-516', grade: '60', pNumber: '1', groupNumber: 1, minTensilePsi: 60000 },
  { specification: 'SA-106', grade: 'B', pNumber: '1', groupNumber: 1, minTensilePsi: 60000 },
  { specification: 'SA-106', grade: 'C', pNumber: '1', groupNumber: 2, minTensilePsi: 70000 },
  { specification: 'SA-105', grade: '—', pNumber: '1', groupNumber: 2, minTensilePsi: 70000 },
  { specification: 'SA-1011', grade: 'CS Type B', pNumber: '1', groupNumber: 1, minTensilePsi: 40000 },
  { specification: 'SA-240', grade: '304L', pNumber: '8', groupNumber: 1, minTensilePsi: 70000 },
] as const

export const demoFillerMetals = [
  { specification: 'SFA-5.1', classification: 'E7018', fNumber: '4', aNumber: '1' },
  { specification: 'SFA-5.1', classification: 'E6010', fNumber: '3', aNumber: '1' },
  { specification: 'SFA-5.18', classification: 'ER70S-6', fNumber: '6', aNumber: '1' },
  { specification: 'SFA-5.18', classification: 'ER70S-2', fNumber: '6', aNumber: '1' },
  { specification: 'SFA-5.20', classification: 'E71T-1C', fNumber: '6', aNumber: '1' },
  { specification: 'SFA-5.9', classification: 'ER308L', fNumber: '6', aNumber: '8' },
  { specification: 'SFA-5.9', classification: 'ER309L', fNumber: '6', aNumber: '8' },
  { specification: 'SFA-5.4', classification: 'E309L-16', fNumber: '5', aNumber: '8' },
] as const

/** PQRs: the coupon as welded and its results (demo values). */
export const demoPqrs = [
  {
    number: 'PQR-K101', daysAgo: 420, code: 'asme-ix', edition: '2019', unit: 'in', process: 'GMAW', transfer: 'short-circuit',
    couponThickness: 0.1345, depositThickness: 0.1345, base: ['SA-1011', 'CS Type B'], filler: ['SFA-5.18', 'ER70S-6'],
    actuals: { amps: 118, volts: 18.2, wireFeed: 235, travelSpeed: 14, gas: '75Ar-25CO2', gasFlow: 30, position: '1G', preheat: 50 },
    labReportNumber: 'LAB-24-0871', status: 'certified',
    tensile: [
      { label: 'T1', width: 0.75, thickness: 0.1345, load: 5410, breakLocation: 'base metal' },
      { label: 'T2', width: 0.751, thickness: 0.1342, load: 5380, breakLocation: 'base metal' },
    ],
    bends: [
      { type: 'face', largestIndication: 0 }, { type: 'face', largestIndication: 0.02 },
      { type: 'root', largestIndication: 0 }, { type: 'root', largestIndication: 0.03 },
    ],
  },
  {
    number: 'PQR-K102', daysAgo: 900, code: 'asme-ix', edition: '2019', unit: 'in', process: 'SMAW', transfer: null,
    couponThickness: 0.75, depositThickness: 0.75, base: ['SA-516', '70'], filler: ['SFA-5.1', 'E7018'],
    actuals: { amps: 125, volts: 23, travelSpeed: 6, position: '3G', progression: 'uphill', preheat: 60, interpass: 450 },
    labReportNumber: 'LAB-23-0412', status: 'certified',
    tensile: [
      { label: 'T1', width: 0.75, thickness: 0.745, load: 41200, breakLocation: 'base metal' },
      { label: 'T2', width: 0.752, thickness: 0.748, load: 41650, breakLocation: 'weld metal' },
    ],
    bends: [
      { type: 'side', largestIndication: 0 }, { type: 'side', largestIndication: 0.04 },
      { type: 'side', largestIndication: 0 }, { type: 'side', largestIndication: 0.06 },
    ],
  },
  {
    number: 'PQR-K103', daysAgo: 610, code: 'asme-ix', edition: '2021', unit: 'in', process: 'GTAW', transfer: null,
    couponThickness: 0.337, depositThickness: 0.337, base: ['SA-106', 'B'], filler: ['SFA-5.18', 'ER70S-2'],
    actuals: { amps: 110, volts: 12, travelSpeed: 3.5, gas: 'Ar', gasFlow: 20, position: '6G', progression: 'uphill', preheat: 50 },
    labReportNumber: 'LAB-24-0150', status: 'certified',
    tensile: [
      { label: 'T1', width: 0.75, thickness: 0.33, load: 16900, breakLocation: 'base metal' },
      { label: 'T2', width: 0.75, thickness: 0.332, load: 16750, breakLocation: 'base metal' },
    ],
    bends: [
      { type: 'face', largestIndication: 0 }, { type: 'face', largestIndication: 0 },
      { type: 'root', largestIndication: 0.05 }, { type: 'root', largestIndication: 0 },
    ],
  },
  {
    number: 'PQR-K104', daysAgo: 75, code: 'asme-ix', edition: '2023', unit: 'in', process: 'FCAW', transfer: null,
    couponThickness: 1, depositThickness: 1, base: ['SA-516', '70'], filler: ['SFA-5.20', 'E71T-1C'],
    actuals: { amps: 230, volts: 25.5, wireFeed: 350, travelSpeed: 10, gas: '100CO2', gasFlow: 45, position: '2G', preheat: 100 },
    labReportNumber: 'LAB-26-0933', status: 'recorded',
    tensile: [
      { label: 'T1', width: 0.75, thickness: 0.98, load: 53900, breakLocation: 'base metal' },
      { label: 'T2', width: 0.75, thickness: 0.99, load: 54300, breakLocation: 'base metal' },
    ],
    bends: [
      { type: 'side', largestIndication: 0 }, { type: 'side', largestIndication: 0 },
      { type: 'side', largestIndication: 0.02 }, { type: 'side', largestIndication: 0 },
    ],
  },
  {
    // A combination coupon: GTAW root and hot pass, SMAW fill and cap, carbon steel pipe to austenitic stainless plate.
    number: 'PQR-K105', daysAgo: 150, code: 'asme-ix', edition: '2023', unit: 'in', process: 'GTAW', transfer: null,
    couponThickness: 0.5, depositThickness: 0.5, base: ['SA-106', 'B'], baseB: ['SA-240', '304L'], filler: ['SFA-5.9', 'ER309L'],
    welder: 'KB-03',
    actuals: { position: '6G', progression: 'uphill', preheat: 60, interpass: 340 },
    layers: [
      { name: 'root and hot pass', process: 'GTAW', filler: ['SFA-5.9', 'ER309L'], fillerSize: 0.09375, depositThickness: 0.125, current: 'DCEN', amps: 105, volts: 11.5, travelSpeed: 3.2, gas: 'Argon', gasFlow: 20, tungsten: 'EWCe-2, 3/32 in', backingGas: 'Argon, 15 ft³/h' },
      { name: 'fill and cap', process: 'SMAW', filler: ['SFA-5.4', 'E309L-16'], fillerSize: 0.125, depositThickness: 0.375, current: 'DCEP', amps: 112, volts: 24, travelSpeed: 5 },
    ],
    labReportNumber: 'LAB-26-0488', status: 'certified',
    tensile: [
      { label: 'T1', width: 0.75, thickness: 0.495, load: 26300, breakLocation: 'base metal' },
      { label: 'T2', width: 0.751, thickness: 0.497, load: 26150, breakLocation: 'base metal' },
    ],
    bends: [
      { type: 'side', largestIndication: 0 }, { type: 'side', largestIndication: 0.02 },
      { type: 'side', largestIndication: 0 }, { type: 'side', largestIndication: 0 },
    ],
  },
] as const

const window = (min: number, max: number) => ({ min, max })
const set = (setPoint: number, trim: number) => ({ min: Math.round((setPoint - trim) * 1000) / 1000, max: Math.round((setPoint + trim) * 1000) / 1000, setPoint })
const noWindow = { min: null, max: null, setPoint: null }
const pipeLayer = {
  transfer: null, fillerAdded: null, wireFeed: noWindow, ctwd: noWindow, pulsing: false, oscillation: null, electrodes: 'single', passesPerSide: null,
  backGouging: false, tungsten: { type: null, size: null }, backingGas: { composition: null, flow: noWindow }, consumableInsert: null, flux: { name: null, classification: null },
}

/** WPSs: number, revision, status and the variables a WPS states (demo values). */
export const demoProcedures = [
  {
    number: 'KB-W01', revision: 0, status: 'approved', title: 'GMAW short-circuit, carbon steel sheet, square groove and fillet',
    code: 'asme-ix', edition: '2019', unit: 'in', process: 'GMAW', transfer: 'short-circuit', pqrs: ['PQR-K101'],
    pNumbers: ['1', '1'], thickness: window(0.0625, 0.1479), diameterMin: null, positions: ['F', 'H', 'V', 'O'], fNumbers: ['6'],
    variables: {
      joints: { type: 'butt and tee', groove: 'square groove, 0 to 1/16 in root opening', backing: 'none' },
      fillers: [{ specification: 'SFA-5.18', classification: 'ER70S-6', size: '0.035 in' }],
      progression: 'downhill', preheatMin: 50, interpassMax: 350, pwht: 'none',
      gas: { composition: '75% Ar / 25% CO2', flow: window(25, 35) },
      electrical: { current: 'DCEP', amps: window(95, 135), volts: window(17, 19.5), wireFeed: window(190, 270), travelSpeed: window(10, 18), heatInputMax: null },
      technique: { bead: 'stringer', ctwd: window(0.375, 0.5), cleaning: 'wire brush between passes' },
    },
  },
  {
    number: 'KB-W02', revision: 0, status: 'superseded', title: 'SMAW, carbon steel plate, single-V groove',
    code: 'asme-ix', edition: '2019', unit: 'in', process: 'SMAW', transfer: null, pqrs: ['PQR-K102'],
    pNumbers: ['1', '1'], thickness: window(0.1875, 1.25), diameterMin: null, positions: ['F', 'H', 'V', 'O'], fNumbers: ['4'],
    variables: {
      joints: { type: 'butt', groove: 'single-V, 60° included, 1/8 in root opening', backing: 'steel backing bar' },
      fillers: [{ specification: 'SFA-5.1', classification: 'E7018', size: '1/8 in' }],
      progression: 'uphill', preheatMin: 60, interpassMax: 450, pwht: 'none',
      electrical: { current: 'DCEP', amps: window(105, 140), volts: window(21, 25), travelSpeed: window(4, 8), heatInputMax: null },
      technique: { bead: 'stringer or weave', cleaning: 'chip and grind between passes' },
    },
  },
  {
    number: 'KB-W02', revision: 1, status: 'approved', title: 'SMAW, carbon steel plate, single-V groove',
    code: 'asme-ix', edition: '2019', unit: 'in', process: 'SMAW', transfer: null, pqrs: ['PQR-K102'],
    pNumbers: ['1', '1'], thickness: window(0.1875, 1.5), diameterMin: null, positions: ['F', 'H', 'V', 'O'], fNumbers: ['4'],
    variables: {
      joints: { type: 'butt', groove: 'single-V, 60° included, 1/8 in root opening', backing: 'steel backing bar or back-gouged' },
      fillers: [{ specification: 'SFA-5.1', classification: 'E7018', size: '1/8 in and 5/32 in' }],
      progression: 'uphill', preheatMin: 60, interpassMax: 450, pwht: 'none',
      electrical: { current: 'DCEP', amps: window(105, 160), volts: window(21, 26), travelSpeed: window(4, 9), heatInputMax: null },
      technique: { bead: 'stringer or weave, weave no wider than 3 electrode diameters', cleaning: 'chip and grind between passes' },
    },
  },
  {
    number: 'KB-W03', revision: 0, status: 'approved', title: 'GTAW, carbon steel pipe, open root',
    code: 'asme-ix', edition: '2021', unit: 'in', process: 'GTAW', transfer: null, pqrs: ['PQR-K103'],
    pNumbers: ['1', '1'], thickness: window(0.0625, 0.674), diameterMin: 1, positions: ['F', 'H', 'V', 'O'], fNumbers: ['6'],
    variables: {
      joints: { type: 'pipe butt', groove: 'single-V, 75° included, 3/32 in root opening, 1/16 in root face', backing: 'none (open root)' },
      fillers: [{ specification: 'SFA-5.18', classification: 'ER70S-2', size: '3/32 in' }],
      progression: 'uphill', preheatMin: 50, interpassMax: 500, pwht: 'none',
      gas: { composition: 'Argon', flow: window(15, 25) },
      electrical: { current: 'DCEN', amps: window(80, 130), volts: window(10, 14), travelSpeed: window(2.5, 5), heatInputMax: null },
      technique: { bead: 'stringer', cleaning: 'stainless wire brush' },
    },
  },
  {
    number: 'KB-W04', revision: 0, status: 'draft', title: 'FCAW gas-shielded, carbon steel plate, groove and fillet',
    code: 'asme-ix', edition: '2023', unit: 'in', process: 'FCAW', transfer: null, pqrs: ['PQR-K104'],
    pNumbers: ['1', '1'], thickness: window(0.1875, 2), diameterMin: null, positions: ['F', 'H'], fNumbers: ['6'],
    variables: {
      joints: { type: 'butt and tee', groove: 'single-bevel, 45°, 1/4 in root opening', backing: 'steel backing bar' },
      fillers: [{ specification: 'SFA-5.20', classification: 'E71T-1C', size: '0.045 in' }],
      progression: null, preheatMin: 100, interpassMax: 500, pwht: 'none',
      gas: { composition: '100% CO2', flow: window(40, 50) },
      electrical: { current: 'DCEP', amps: window(200, 260), volts: window(24, 27), wireFeed: window(300, 400), travelSpeed: window(8, 14), heatInputMax: null },
      technique: { bead: 'stringer', ctwd: window(0.75, 1), cleaning: 'wire brush' },
    },
  },
  {
    number: 'KB-W05', revision: 0, status: 'draft', title: 'GMAW short-circuit, 14 gauge ductwork, fillet',
    code: 'asme-ix', edition: '2019', unit: 'in', process: 'GMAW', transfer: 'short-circuit', pqrs: ['PQR-K101'],
    pNumbers: ['1', '1'], thickness: window(0.0625, 0.1479), diameterMin: null, positions: ['F', 'H', 'V'], fNumbers: ['6'],
    variables: {
      joints: { type: 'tee and lap', groove: 'fillet', backing: 'none' },
      fillers: [{ specification: 'SFA-5.18', classification: 'ER70S-6', size: '0.030 in' }],
      progression: 'downhill', preheatMin: 50, interpassMax: 350, pwht: 'none',
      gas: { composition: '75% Ar / 25% CO2', flow: window(25, 35) },
      electrical: { current: 'DCEP', amps: window(60, 120), volts: window(15, 19), wireFeed: window(150, 260), travelSpeed: window(12, 20), heatInputMax: null },
      technique: { bead: 'stringer', ctwd: window(0.25, 0.375), cleaning: 'none required' },
    },
  },
  {
    number: 'KB-W06', revision: 0, status: 'approved', title: 'GTAW root and hot pass, SMAW fill and cap, carbon steel pipe to stainless, open root',
    code: 'asme-ix', edition: '2023', unit: 'in', process: 'GTAW', transfer: null, pqrs: ['PQR-K105'],
    pNumbers: ['1', '8'], groups: [1, 1], thickness: window(0.1875, 1), diameterMin: 2.375, positions: ['F', 'H', 'V', 'O'], fNumbers: ['6', '5'],
    variables: {
      joints: { type: 'pipe butt', groove: 'single-V, 75° included', grooveAngle: 75, rootOpening: window(0.09375, 0.125), rootFace: window(0.0625, 0.09375), backing: 'none (open root, argon purge)' },
      progression: 'uphill', preheatMin: 50, interpassMax: 350, pwht: { required: false, temperature: { min: null, max: null }, holdHours: null, note: null },
      cleaning: 'stainless wire brush, grind starts and stops',
    },
    layers: [
      {
        ...pipeLayer, name: 'root', passes: '1', process: 'GTAW', fillerAdded: true, depositMax: 0.125, current: 'DCEN',
        fillers: [{ specification: 'SFA-5.9', classification: 'ER309L', fNumber: '6', aNumber: '8', size: 0.09375 }],
        amps: set(105, 15), volts: set(11.5, 1.5), travelSpeed: window(2.5, 4.5), heatInputMax: 35000,
        gas: { composition: 'Argon', flow: set(20, 5) }, bead: 'stringer',
        tungsten: { type: 'EWCe-2', size: 0.09375 }, backingGas: { composition: 'Argon', flow: set(15, 5) },
      },
      {
        ...pipeLayer, name: 'hot pass', passes: '2', process: 'GTAW', fillerAdded: true, depositMax: 0.125, current: 'DCEN',
        fillers: [{ specification: 'SFA-5.9', classification: 'ER309L', fNumber: '6', aNumber: '8', size: 0.09375 }],
        amps: set(115, 15), volts: set(12, 1.5), travelSpeed: window(3, 5), heatInputMax: 35000,
        gas: { composition: 'Argon', flow: set(20, 5) }, bead: 'stringer',
        tungsten: { type: 'EWCe-2', size: 0.09375 }, backingGas: { composition: 'Argon', flow: set(15, 5) },
      },
      {
        ...pipeLayer, name: 'fill', passes: '3 to 5', process: 'SMAW', depositMax: 0.5, current: 'DCEP',
        fillers: [{ specification: 'SFA-5.4', classification: 'E309L-16', fNumber: '5', aNumber: '8', size: 0.125 }],
        amps: set(110, 15), volts: set(24, 2), travelSpeed: window(3.5, 7), heatInputMax: 45000,
        gas: { composition: null, flow: noWindow }, bead: 'stringer or weave, no wider than 3 electrode diameters',
      },
      {
        ...pipeLayer, name: 'cap', passes: '6 to 8', process: 'SMAW', depositMax: 0.25, current: 'DCEP',
        fillers: [{ specification: 'SFA-5.4', classification: 'E309L-16', fNumber: '5', aNumber: '8', size: 0.125 }],
        amps: set(115, 15), volts: set(24.5, 2), travelSpeed: window(3.5, 7), heatInputMax: 45000,
        gas: { composition: null, flow: noWindow }, bead: 'stringer',
      },
    ],
  },
] as const

/**
 * Welder tests (demo). `bends` give the largest open discontinuity of each specimen, inches.
 * Status 'failed' keeps a failed test on the record.
 */
export const demoWelderTests = [
  { stamp: 'KB-01', wps: 'KB-W02', daysAgo: 700, process: 'SMAW', form: 'plate', weld: 'groove', t: 0.375, positions: ['3G', '4G'], f: '4', backing: true, bends: [['side', 0], ['side', 0.03]] },
  { stamp: 'KB-01', wps: 'KB-W03', daysAgo: 500, process: 'GTAW', form: 'pipe', weld: 'groove', t: 0.28, od: 2.375, positions: ['6G'], f: '6', backing: false, bends: [['face', 0], ['root', 0], ['face', 0.02], ['root', 0]] },
  { stamp: 'KB-02', wps: 'KB-W01', daysAgo: 390, process: 'GMAW', transfer: 'short-circuit', form: 'plate', weld: 'groove', t: 0.1345, positions: ['3G'], f: '6', backing: false, bends: [['face', 0], ['root', 0.04]] },
  { stamp: 'KB-02', wps: 'KB-W02', daysAgo: 380, process: 'SMAW', form: 'plate', weld: 'groove', t: 1, positions: ['2G', '3G', '4G'], f: '4', backing: true, bends: [['side', 0], ['side', 0]] },
  { stamp: 'KB-03', wps: 'KB-W01', daysAgo: 260, process: 'GMAW', transfer: 'short-circuit', form: 'plate', weld: 'groove', t: 0.1345, positions: ['3G', '4G'], f: '6', backing: false, bends: [['face', 0.02], ['root', 0]] },
  { stamp: 'KB-03', wps: 'KB-W02', daysAgo: 240, process: 'SMAW', form: 'plate', weld: 'groove', t: 0.375, positions: ['3G'], f: '4', backing: true, bends: [['face', 0], ['root', 0.0625]] },
  { stamp: 'KB-04', wps: 'KB-W02', daysAgo: 330, process: 'SMAW', form: 'pipe', weld: 'groove', t: 0.432, od: 6.625, positions: ['6G'], f: '4', backing: true, bends: [['side', 0], ['side', 0], ['side', 0.05], ['side', 0]] },
  { stamp: 'KB-05', wps: 'KB-W03', daysAgo: 300, process: 'GTAW', form: 'pipe', weld: 'groove', t: 0.154, od: 1.315, positions: ['5G'], f: '6', backing: false, bends: [['face', 0], ['root', 0], ['face', 0], ['root', 0]] },
  { stamp: 'KB-05', wps: 'KB-W01', daysAgo: 290, process: 'GMAW', transfer: 'short-circuit', form: 'plate', weld: 'fillet', t: 0.1345, positions: ['2F'], f: '6', backing: false, bends: [] },
  { stamp: 'KB-06', wps: 'KB-W02', daysAgo: 280, process: 'SMAW', form: 'plate', weld: 'groove', t: 0.375, positions: ['4G'], f: '4', backing: true, bends: [['face', 0], ['root', 0.2]], status: 'failed' },
  { stamp: 'KB-06', wps: 'KB-W02', daysAgo: 250, process: 'SMAW', form: 'plate', weld: 'groove', t: 0.375, positions: ['4G'], f: '4', backing: true, bends: [['face', 0], ['root', 0.1]] },
  { stamp: 'KB-07', wps: 'KB-W03', daysAgo: 230, process: 'GTAW', form: 'pipe', weld: 'groove', t: 0.218, od: 2.375, positions: ['2G'], f: '6', backing: false, bends: [['face', 0], ['root', 0]] },
  { stamp: 'KB-07', wps: 'KB-W02', daysAgo: 225, process: 'SMAW', form: 'plate', weld: 'groove', t: 0.75, positions: ['3G'], f: '4', backing: true, bends: [['side', 0], ['side', 0.04]] },
  { stamp: 'KB-08', wps: 'KB-W04', daysAgo: 60, process: 'FCAW', form: 'plate', weld: 'groove', t: 1, positions: ['3G', '4G'], f: '6', backing: true, bends: [['side', 0], ['side', 0]], status: 'recorded' },
  { stamp: 'KB-09', wps: 'KB-W01', daysAgo: 200, process: 'GMAW', transfer: 'short-circuit', form: 'plate', weld: 'groove', t: 0.0747, positions: ['1G'], f: '6', backing: false, bends: [['face', 0], ['root', 0]] },
  { stamp: 'KB-09', wps: 'KB-W02', daysAgo: 195, process: 'SMAW', form: 'plate', weld: 'groove', t: 0.5, positions: ['2G'], f: '4', backing: true, bends: [['side', 0], ['side', 0]] },
  { stamp: 'KB-10', wps: 'KB-W03', daysAgo: 420, process: 'GTAW', form: 'pipe', weld: 'groove', t: 0.337, od: 4.5, positions: ['6G'], f: '6', backing: false, bends: [['face', 0], ['root', 0], ['face', 0.03], ['root', 0]] },
  { stamp: 'KB-10', wps: 'KB-W02', daysAgo: 410, process: 'SMAW', form: 'pipe', weld: 'groove', t: 0.432, od: 6.625, positions: ['5G'], f: '4', backing: true, bends: [['side', 0], ['side', 0], ['side', 0], ['side', 0]] },
  { stamp: 'KB-11', wps: 'KB-W01', daysAgo: 20, process: 'GMAW', transfer: 'short-circuit', form: 'plate', weld: 'groove', t: 0.1345, positions: ['2G'], f: '6', backing: false, bends: [['face', 0], ['root', 0.0625]], status: 'recorded' },
  { stamp: 'KB-12', wps: 'KB-W02', daysAgo: 800, process: 'SMAW', form: 'plate', weld: 'groove', t: 0.375, positions: ['1G'], f: '4', backing: true, bends: [['face', 0], ['root', 0]] },
  // A 6G combination coupon, GTAW root and hot pass then SMAW: the welder of PQR-K105 qualified by its coupon (QW-301.2)
  {
    stamp: 'KB-03', wps: 'KB-W06', pqr: 'PQR-K105', daysAgo: 150, process: 'GTAW', form: 'pipe', weld: 'groove', t: 0.5, od: 6.625, positions: ['6G'], f: '6', backing: false,
    processes: [{ process: 'GTAW', transfer: null, depositThickness: 0.125, fNumber: '6' }, { process: 'SMAW', transfer: null, depositThickness: 0.375, fNumber: '5' }],
    bends: [['side', 0], ['side', 0], ['side', 0.03], ['side', 0]],
  },
] as const

/**
 * Continuity: for each welder and process, the days before seeding on which production welding was logged.
 * Under ASME QW-322.1 a qualification lapses 6 months after the last use, so ~160 days ago lapses within a month
 * and ~200 days ago has lapsed.
 */
export const demoContinuity: { stamp: string, process: string, daysAgo: number[], reference: string }[] = [
  { stamp: 'KB-01', process: 'SMAW', daysAgo: [230, 170, 110, 40, 6], reference: 'KB-2611 spool 4' },
  { stamp: 'KB-01', process: 'GTAW', daysAgo: [240, 200, 163], reference: 'KB-2598 line 12' },
  { stamp: 'KB-02', process: 'GMAW', daysAgo: [220, 150, 90, 12], reference: 'KB-2615 duct run B' },
  { stamp: 'KB-02', process: 'SMAW', daysAgo: [235, 207], reference: 'KB-2598 skid frame' },
  { stamp: 'KB-03', process: 'GMAW', daysAgo: [200, 120, 45, 9], reference: 'KB-2615 hood panels' },
  { stamp: 'KB-03', process: 'SMAW', daysAgo: [210, 172], reference: 'KB-2611 nozzle pads' },
  { stamp: 'KB-03', process: 'GTAW', daysAgo: [120, 61], reference: 'KB-2611 stainless drain nozzle' },
  { stamp: 'KB-04', process: 'SMAW', daysAgo: [240, 180, 100, 30], reference: 'KB-2611 shell seams' },
  { stamp: 'KB-05', process: 'GTAW', daysAgo: [225, 190, 168], reference: 'KB-2598 instrument lines' },
  { stamp: 'KB-05', process: 'GMAW', daysAgo: [215, 140, 66], reference: 'KB-2615 brackets' },
  { stamp: 'KB-06', process: 'SMAW', daysAgo: [220, 205, 199], reference: 'KB-2598 pipe rack' },
  { stamp: 'KB-07', process: 'GTAW', daysAgo: [200, 100, 14], reference: 'KB-2611 drain lines' },
  { stamp: 'KB-07', process: 'SMAW', daysAgo: [210, 176], reference: 'KB-2611 saddle supports' },
  { stamp: 'KB-09', process: 'GMAW', daysAgo: [180, 81, 3], reference: 'KB-2615 access doors' },
  { stamp: 'KB-09', process: 'SMAW', daysAgo: [185, 161], reference: 'KB-2598 ladder clips' },
  { stamp: 'KB-10', process: 'GTAW', daysAgo: [230, 214, 190], reference: 'KB-2598 tie-ins' },
  { stamp: 'KB-10', process: 'SMAW', daysAgo: [240, 150, 20], reference: 'KB-2611 shell seams' },
]

export const demoCustomers = [
  { name: 'Larchmont Process Systems', contact: 'quality@larchmont-process.test' },
  { name: 'Northgate Air Handling', contact: 'supplier.quality@northgate-air.test' },
] as const

export const demoProjects = [
  { number: 'KB-2611', name: 'Condensate receiver vessel V-204', customer: 'Larchmont Process Systems', startDaysAgo: 240, endDaysAgo: null, procedures: ['KB-W02@1', 'KB-W03@0'], welders: ['KB-01', 'KB-03', 'KB-04', 'KB-07', 'KB-10'] },
  { number: 'KB-2598', name: 'Utility pipe rack, bays 1–6', customer: 'Larchmont Process Systems', startDaysAgo: 250, endDaysAgo: 150, procedures: ['KB-W02@0', 'KB-W03@0'], welders: ['KB-01', 'KB-02', 'KB-05', 'KB-06', 'KB-09', 'KB-10'] },
  { number: 'KB-2615', name: 'Exhaust hoods and duct, line 3', customer: 'Northgate Air Handling', startDaysAgo: 225, endDaysAgo: null, procedures: ['KB-W01@0'], welders: ['KB-02', 'KB-03', 'KB-05', 'KB-09'] },
] as const
