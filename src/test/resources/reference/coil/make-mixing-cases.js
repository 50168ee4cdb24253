#!/usr/bin/env node
/*
 * make-mixing-cases.js — writes mixing-cases.json, outside reference values for the Latent Ledger
 * adiabatic-mixing (return + outdoor air) tests.
 *
 * States (humidity ratio, enthalpy, specific volume, dew point, wet bulb, and the dry bulb back
 * from enthalpy and humidity ratio) come from PsychroLib 2.5.0 (JavaScript; npm package
 * psychrolib@1.1.1), SI units, used as shipped:
 *   D. Meyer and D. Thevenard (2019), "PsychroLib: a library of psychrometric functions to
 *   calculate thermodynamic properties of air", J. Open Source Software 4(33), 1137.
 * The mixing is written out here, independently of the Java code, from ASHRAE Handbook—
 * Fundamentals 2017/2021 ch. 1, "Adiabatic mixing of two streams of moist air" (dry-air, water
 * and energy balances on a dry-air basis):
 *   m_i = V_i / v_i                        (each stream's volume flow at its own state, eq. 28 v)
 *   W3  = (m1 W1 + m2 W2) / (m1 + m2)
 *   h3  = (m1 h1 + m2 h2) / (m1 + m2)
 *   t3  = GetTDryBulbFromEnthalpyAndHumRatio(h3, W3)
 * The outdoor-air fraction f is by volume, f = V_oa / (V_oa + V_ra); the dry-air mass fraction
 * is x = (f / v_oa) / (f / v_oa + (1 - f) / v_ra).
 * Where a case gives a supply reading and airflow, the coil process is evaluated on the mixed
 * entering state as make-coil-cases.js does (same equations, copied here to keep this script
 * standalone).
 *
 * Regenerate (node >= 14; keep node_modules OUT of this repository):
 *   mkdir -p /tmp/psl-coil && cd /tmp/psl-coil && npm init -y && npm install psychrolib@1.1.1
 *   cd <repo>/src/test/resources/reference/coil
 *   NODE_PATH=/tmp/psl-coil/node_modules node make-mixing-cases.js > mixing-cases.json
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
  return { db, W, h: psy.GetMoistAirEnthalpy(db, W), v: psy.GetMoistAirVolume(db, W, p) };
}

function mix(p, ret, oa, oaVolumeFraction) {
  const f = oaVolumeFraction;
  const x = (f / oa.v) / (f / oa.v + (1 - f) / ret.v);
  const W = (1 - x) * ret.W + x * oa.W;
  const h = (1 - x) * ret.h + x * oa.h;
  const db = psy.GetTDryBulbFromEnthalpyAndHumRatio(h, W);
  return {
    oaMassFraction: x, W, h, db,
    wb: psy.GetTWetBulbFromHumRatio(db, W, p),
    dp: psy.GetTDewPointFromHumRatio(db, W, p),
    v: psy.GetMoistAirVolume(db, W, p),
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

function coil(p, s1, s2, airflowM3PerS) {
  const m = airflowM3PerS / s1.v; // airflow measured in the mixed air entering the coil
  const total = m * ((s1.h - s2.h) - (s1.W - s2.W) * 4186 * s2.db);
  const sensible = m * (s1.h - psy.GetMoistAirEnthalpy(s2.db, s1.W));
  const a = adp(p, s1, s2);
  return {
    massFlowKgPerS: m, totalW: total, sensibleW: sensible, latentW: total - sensible, shr: sensible / total,
    moistureKgPerS: m * (s1.W - s2.W), adpC: a, bypassFactor: a === null ? null : (s2.db - a) / (s1.db - a),
  };
}

function run(c) {
  const p = c.pressurePa;
  const ret = stateOf(p, c.returnDb, c.returnKind, c.returnValue);
  const oa = stateOf(p, c.outdoorDb, c.outdoorKind, c.outdoorValue);
  const m = mix(p, ret, oa, c.outdoorVolumeFraction);
  const out = Object.assign({}, c, {
    returnW: ret.W, returnH: ret.h, returnVolume: ret.v,
    outdoorW: oa.W, outdoorH: oa.h, outdoorVolume: oa.v,
    mixedOutdoorMassFraction: m.oaMassFraction, mixedW: m.W, mixedH: m.h, mixedDb: m.db,
    mixedWetBulb: m.wb, mixedDewPoint: m.dp, mixedVolume: m.v,
  });
  if (c.supplyDb !== undefined) {
    const s2 = stateOf(p, c.supplyDb, c.supplyKind, c.supplyValue);
    out.coil = coil(p, { db: m.db, W: m.W, h: m.h, v: m.v }, s2, c.airflowM3PerS);
  }
  return out;
}

const cases = [
  { id: 'hof-ch1-mixing-example',
    note: 'HoF 2021 SI ch. 1 mixing example inputs: 2 m3/s outdoor 4 C db / 2 C wb with 6.25 m3/s recirculated 25 C / 50 %',
    pressurePa: 101325, returnDb: 25, returnKind: 'rh', returnValue: 50,
    outdoorDb: 4, outdoorKind: 'wb', outdoorValue: 2, outdoorVolumeFraction: 2 / 8.25 },
  { id: 'humid-summer-20pct',
    note: 'return 75 F / 50 %, outdoor 92 F db / 77 F wb, 20 % outdoor air by volume, sea level; supply 55 F / 90 %, 1200 cfm',
    pressurePa: 101325, returnDb: fToC(75), returnKind: 'rh', returnValue: 50,
    outdoorDb: fToC(92), outdoorKind: 'wb', outdoorValue: fToC(77), outdoorVolumeFraction: 0.20,
    supplyDb: fToC(55), supplyKind: 'rh', supplyValue: 90, airflowM3PerS: cfmToM3s(1200) },
  { id: 'dew-point-1000ft-15pct',
    note: 'return 76 F / dp 58 F, outdoor 88 F / dp 72 F, 15 % by volume, 1000 ft; supply 56 F / dp 54 F, 1000 cfm',
    pressurePa: psy.GetStandardAtmPressure(ftToM(1000)), returnDb: fToC(76), returnKind: 'dp', returnValue: fToC(58),
    outdoorDb: fToC(88), outdoorKind: 'dp', outdoorValue: fToC(72), outdoorVolumeFraction: 0.15,
    supplyDb: fToC(56), supplyKind: 'dp', supplyValue: fToC(54), airflowM3PerS: cfmToM3s(1000) },
  { id: 'altitude-dry-30pct',
    note: 'return 24 C / 45 %, outdoor 32 C / 25 %, 30 % by volume, 1600 m',
    pressurePa: psy.GetStandardAtmPressure(1600), returnDb: 24, returnKind: 'rh', returnValue: 45,
    outdoorDb: 32, outdoorKind: 'rh', outdoorValue: 25, outdoorVolumeFraction: 0.30 },
  { id: 'cool-outdoor-40pct',
    note: 'return 72 F / 55 %, outdoor 58 F / 90 %, 40 % by volume, sea level (economiser-season mix)',
    pressurePa: 101325, returnDb: fToC(72), returnKind: 'rh', returnValue: 55,
    outdoorDb: fToC(58), outdoorKind: 'rh', outdoorValue: 90, outdoorVolumeFraction: 0.40 },
];

process.stdout.write(JSON.stringify({
  generator: 'make-mixing-cases.js with PsychroLib 2.5.0 (npm psychrolib@1.1.1), SI units',
  cases: cases.map(run),
}, null, 2) + '\n');
