/**
 * Nitrogen and argon at 101325 Pa, 300–2000 K every 100 K: density (kg/m³), isobaric heat
 * capacity (J/(kg·K)), thermal conductivity (W/(m·K)), dynamic viscosity (Pa·s), Prandtl number.
 * [Computed] from the NIST reference equations of state and transport (Span et al. 2000 for N2,
 * Tegeler et al. 1999 for Ar; Lemmon & Jacobsen 2004 transport) via CoolProp 8.0.0.
 * Embedded copy of gas-properties-1atm.csv in this folder (the core may not read files);
 * tests/shared/metallurgy/powder/gas-properties-table.test.ts asserts that both are identical.
 */

/** Atomising gases in the table. */
export type AtomisingGas = "N2" | "Ar";

/** One row of the gas table (SI units). */
export interface GasPropertyRow {
  readonly gas: AtomisingGas;
  readonly tempK: number;
  readonly densityKgPerM3: number;
  readonly heatCapacityJPerKgK: number;
  readonly conductivityWPerMK: number;
  readonly viscosityPaS: number;
  readonly prandtl: number;
}

// Columns: gas, tempK, densityKgPerM3, heatCapacityJPerKgK, conductivityWPerMK, viscosityPaS, prandtl
const ROWS: readonly (readonly [AtomisingGas, number, number, number, number, number, number])[] = [
  ["N2", 300, 1.1382, 1041.4, 0.025969, 1.789e-05, 0.7174],
  ["N2", 400, 0.85323, 1045, 0.032806, 2.2208e-05, 0.7074],
  ["N2", 500, 0.6825, 1056.4, 0.039043, 2.6063e-05, 0.7052],
  ["N2", 600, 0.56873, 1075.1, 0.044841, 2.9577e-05, 0.7092],
  ["N2", 700, 0.48749, 1098.1, 0.050306, 3.2833e-05, 0.7167],
  ["N2", 800, 0.42656, 1122.3, 0.055514, 3.5887e-05, 0.7255],
  ["N2", 900, 0.37918, 1145.7, 0.06052, 3.878e-05, 0.7342],
  ["N2", 1000, 0.34127, 1167.4, 0.065363, 4.1543e-05, 0.742],
  ["N2", 1100, 0.31025, 1186.8, 0.070075, 4.4199e-05, 0.7486],
  ["N2", 1200, 0.2844, 1204, 0.074679, 4.6767e-05, 0.754],
  ["N2", 1300, 0.26253, 1219.1, 0.079194, 4.9259e-05, 0.7583],
  ["N2", 1400, 0.24378, 1232.3, 0.083635, 5.1689e-05, 0.7616],
  ["N2", 1500, 0.22753, 1243.9, 0.088015, 5.4066e-05, 0.7641],
  ["N2", 1600, 0.21332, 1254, 0.092344, 5.6398e-05, 0.7659],
  ["N2", 1700, 0.20077, 1263, 0.096631, 5.8691e-05, 0.7671],
  ["N2", 1800, 0.18962, 1270.8, 0.10088, 6.095e-05, 0.7678],
  ["N2", 1900, 0.17964, 1277.8, 0.10511, 6.3182e-05, 0.7681],
  ["N2", 2000, 0.17066, 1284.1, 0.10931, 6.5389e-05, 0.7681],
  ["Ar", 300, 1.6238, 521.54, 0.017837, 2.2741e-05, 0.6649],
  ["Ar", 400, 1.2171, 520.94, 0.022516, 2.8704e-05, 0.6641],
  ["Ar", 500, 0.97349, 520.69, 0.026726, 3.4078e-05, 0.6639],
  ["Ar", 600, 0.81118, 520.57, 0.030573, 3.8997e-05, 0.664],
  ["Ar", 700, 0.69528, 520.5, 0.034134, 4.3556e-05, 0.6642],
  ["Ar", 800, 0.60837, 520.46, 0.037463, 4.7825e-05, 0.6644],
  ["Ar", 900, 0.54078, 520.43, 0.040601, 5.1855e-05, 0.6647],
  ["Ar", 1000, 0.48671, 520.41, 0.043581, 5.5686e-05, 0.6649],
  ["Ar", 1100, 0.44247, 520.39, 0.046428, 5.9349e-05, 0.6652],
  ["Ar", 1200, 0.4056, 520.38, 0.049161, 6.2869e-05, 0.6655],
  ["Ar", 1300, 0.3744, 520.37, 0.051796, 6.6266e-05, 0.6657],
  ["Ar", 1400, 0.34766, 520.37, 0.054347, 6.9557e-05, 0.666],
  ["Ar", 1500, 0.32449, 520.36, 0.056824, 7.2755e-05, 0.6662],
  ["Ar", 1600, 0.30421, 520.36, 0.059237, 7.5871e-05, 0.6665],
  ["Ar", 1700, 0.28632, 520.35, 0.061593, 7.8916e-05, 0.6667],
  ["Ar", 1800, 0.27042, 520.35, 0.063899, 8.1897e-05, 0.6669],
  ["Ar", 1900, 0.25618, 520.35, 0.066161, 8.4821e-05, 0.6671],
  ["Ar", 2000, 0.24338, 520.35, 0.068383, 8.7696e-05, 0.6673],
];

/** The gas property table as typed rows, ordered by gas then temperature. */
export const GAS_PROPERTIES_1ATM: readonly GasPropertyRow[] = Object.freeze(
  ROWS.map(([gas, tempK, densityKgPerM3, heatCapacityJPerKgK, conductivityWPerMK, viscosityPaS, prandtl]) =>
    Object.freeze({ gas, tempK, densityKgPerM3, heatCapacityJPerKgK, conductivityWPerMK, viscosityPaS, prandtl }),
  ),
);
