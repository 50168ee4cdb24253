#!/usr/bin/env node
/*
 * make-coil-cases.js — writes coil-cases.json, outside reference values for the Latent Ledger
 * coil check tests.
 *
 * States (humidity ratio, enthalpy, specific volume, dew point, saturation humidity ratio) come
 * from PsychroLib 2.5.0 (JavaScript; npm package psychrolib@1.1.1), SI units, used as shipped:
 *   D. Meyer and D. Thevenard (2019), "PsychroLib: a library of psychrometric functions to
 *   calculate thermodynamic properties of air", J. Open Source Software 4(33), 1137.
 * The coil process is then written out here, independently of the Java code, from ASHRAE
 * Handbook—Fundamentals 2017/2021 SI ch. 1 (Example 3 energy balance):
 *   m_da = V / v(at the airflow point)           (eq. 28 for v)
 *   q    = m_da [(h1 - h2) - (W1 - W2) hw2],  hw2 = 4.186 t2 kJ/kg   (eq. 43)
 *   q_s  = m_da [h(t1, W1) - h(t2, W1)]       (sensible at the entering humidity ratio)
 *   q_l  = q - q_s;  m_w = m_da (W1 - W2)      (eq. 42)
 *   ADP  = where the line through (t1, W1), (t2, W2) meets Ws(t), by plain bisection on
 *          [-40 C, t2] after a coarse 0.05 K scan; BF = (t2 - ADP)/(t1 - ADP)
 *
 * Regenerate (node >= 14; keep node_modules OUT of this repository):
 *   mkdir -p /tmp/psl-coil && cd /tmp/psl-coil && npm init -y && npm install psychrolib@1.1.1
 *   cd <repo>/src/test/resources/reference/coil
 *   NODE_PATH=/tmp/psl-coil/node_modules node make-coil-cases.js > coil-cases.json
 * Output is deterministic.
 */
'use strict';
const psy = require('psychrolib');
psy.SetUnitSystem(psy.SI);

const FT3 = 0.3048 ** 3;
const cfmToM3s = (cfm) => cfm * FT3 / 60;
const fToC = (f) => (f - 32) / 1.8;
const ftToM = (ft) => ft * 0.3048;

function stateOf(p, db, kind, value) {
  let W;
  if (kind === 'rh') W = psy.GetHumRatioFromRelHum(db, value / 100, p);
  else if (kind === 'wb') W = psy.GetHumRatioFromTWetBulb(db, value, p);
  else if (kind === 'dp') W = psy.GetHumRatioFromTDewPoint(value, p);
  else throw new Error(kind);
  return {
    db, W,
    h: psy.GetMoistAirEnthalpy(db, W),          // J/kg dry air
    v: psy.GetMoistAirVolume(db, W, p),         // m3/kg dry air
    dp: psy.GetTDewPointFromHumRatio(db, W, p), // C
  };
}

function adp(p, s1, s2) {
  if (!(s2.W < s1.W) || !(s2.db < s1.db)) return null;
  const slope = (s1.W - s2.W) / (s1.db - s2.db);
  const gap = (t) => psy.GetSatHumRatio(t, p) - (s2.W + slope * (t - s2.db));
  let hi = s2.db;
  if (gap(hi) <= 0) return hi;
  for (let t = s2.db - 0.05; t >= -40; t -= 0.05) {
    if (s2.W + slope * (t - s2.db) <= 0) return null;
    if (gap(t) <= 0) {
      let lo = t;
      for (let i = 0; i < 200; i++) {
        const mid = 0.5 * (lo + hi);
        if (gap(mid) <= 0) lo = mid; else hi = mid;
      }
      return 0.5 * (lo + hi);
    }
    hi = t;
  }
  return null;
}

function coil(c) {
  const p = c.pressurePa;
  const s1 = stateOf(p, c.enteringDb, c.enteringKind, c.enteringValue);
  const s2 = stateOf(p, c.leavingDb, c.leavingKind, c.leavingValue);
  const v = c.airflowAt === 'leaving' ? s2.v : s1.v;
  const m = c.airflowM3PerS / v;
  const hw2 = 4186 * s2.db;
  const total = m * ((s1.h - s2.h) - (s1.W - s2.W) * hw2);
  const sensible = m * (s1.h - psy.GetMoistAirEnthalpy(s2.db, s1.W));
  const a = adp(p, s1, s2);
  return Object.assign({}, c, {
    enteringW: s1.W, leavingW: s2.W, enteringDewPointC: s1.dp, leavingDewPointC: s2.dp,
    enteringVolume: s1.v, massFlowKgPerS: m,
    totalW: total, sensibleW: sensible, latentW: total - sensible, shr: sensible / total,
    moistureKgPerS: m * (s1.W - s2.W),
    adpC: a, bypassFactor: a === null ? null : (s2.db - a) / (s1.db - a),
  });
}

const cases = [
  { id: 'hof-ch1-example3', note: 'HoF 2021 SI ch. 1 Example 3 inputs: 30 C / 50 % at 5 m3/s to saturated 10 C',
    pressurePa: 101325, enteringDb: 30, enteringKind: 'rh', enteringValue: 50,
    leavingDb: 10, leavingKind: 'rh', leavingValue: 100, airflowM3PerS: 5, airflowAt: 'entering' },
  { id: 'case-a-1200cfm', note: 'issue 3 / docs/methods.md 9.5 case A: 1200 cfm, 75 F / 50 % to 55 F / 90 %, sea level',
    pressurePa: 101325, enteringDb: fToC(75), enteringKind: 'rh', enteringValue: 50,
    leavingDb: fToC(55), leavingKind: 'rh', leavingValue: 90, airflowM3PerS: cfmToM3s(1200), airflowAt: 'entering' },
  { id: 'case-c-5000ft', note: 'case A readings at 5000 ft standard atmosphere',
    pressurePa: psy.GetStandardAtmPressure(ftToM(5000)), enteringDb: fToC(75), enteringKind: 'rh', enteringValue: 50,
    leavingDb: fToC(55), leavingKind: 'rh', leavingValue: 90, airflowM3PerS: cfmToM3s(1200), airflowAt: 'entering' },
  { id: 'case-d-humid', note: 'docs/methods.md 9.5 case D: 1200 cfm, 80 F / 50 % to 60 F / 85 %',
    pressurePa: 101325, enteringDb: fToC(80), enteringKind: 'rh', enteringValue: 50,
    leavingDb: fToC(60), leavingKind: 'rh', leavingValue: 85, airflowM3PerS: cfmToM3s(1200), airflowAt: 'entering' },
  { id: 'wet-bulb-supply-airflow', note: 'AHRI-like 80 F db / 67 F wb to 58 F db / 56 F wb, 1000 cfm measured in supply',
    pressurePa: 101325, enteringDb: fToC(80), enteringKind: 'wb', enteringValue: fToC(67),
    leavingDb: fToC(58), leavingKind: 'wb', leavingValue: fToC(56), airflowM3PerS: cfmToM3s(1000), airflowAt: 'leaving' },
  { id: 'dew-point-readings', note: '24 C / dp 16 C to 13 C / dp 11.5 C, 700 L/s, 1600 m',
    pressurePa: psy.GetStandardAtmPressure(1600), enteringDb: 24, enteringKind: 'dp', enteringValue: 16,
    leavingDb: 13, leavingKind: 'dp', leavingValue: 11.5, airflowM3PerS: 0.7, airflowAt: 'entering' },
];

process.stdout.write(JSON.stringify({
  generator: 'make-coil-cases.js with PsychroLib 2.5.0 (npm psychrolib@1.1.1), SI units',
  cases: cases.map(coil),
}, null, 2) + '\n');
