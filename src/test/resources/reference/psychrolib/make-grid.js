#!/usr/bin/env node
/*
 * make-grid.js — writes psychrolib-grid.csv, an outside reference grid of
 * psychrometric states for the Latent Ledger Java tests.
 *
 * Every value in the CSV comes from PsychroLib 2.5.0 (JavaScript), installed
 * from the npm package psychrolib@1.1.1 (a republish of PsychroLib 2.5.0 JS,
 * https://github.com/psychrometrics/psychrolib). The library is used as
 * shipped: no source patches, and its built-in solver tolerance is kept
 * (it is a private closure variable with no setter; see README.md).
 *
 * Citation:
 *   D. Meyer and D. Thevenard (2019), "PsychroLib: a library of psychrometric
 *   functions to calculate thermodynamic properties of air",
 *   Journal of Open Source Software 4(33), 1137.
 *   https://doi.org/10.21105/joss.01137
 *
 * Regenerate (node >= 14; keep node_modules OUT of this repository):
 *   mkdir -p /tmp/psl && cd /tmp/psl && npm init -y && npm install psychrolib@1.1.1
 *   cd <repo>/src/test/resources/reference/psychrolib
 *   NODE_PATH=/tmp/psl/node_modules node make-grid.js > psychrolib-grid.csv
 *
 * stdout: the CSV. stderr: row/skip counts and self-checks (wet-bulb and
 * dew-point solver error, two-wet-bulb rows). The output is deterministic.
 *
 * Columns (see README.md for units and conventions):
 *   units,case,elevation,pressure,dry_bulb,input_kind,input_value,
 *   wet_bulb,dew_point,rel_hum_pct,hum_ratio,enthalpy,volume
 */
'use strict';

const psy = require('psychrolib');

const MIN_HUM_RATIO = 1e-7; // PsychroLib clamps every humidity ratio to >= this value

// Shortest decimal string that round-trips to the same IEEE double: no rounding loss.
function num(x) {
  if (!Number.isFinite(x)) throw new Error('non-finite value ' + x);
  return String(x);
}

function range(from, to, step) {
  const out = [];
  const n = Math.round((to - from) / step);
  for (let i = 0; i <= n; i++) out.push(from + i * step); // exact for these steps
  return out;
}

const SYSTEMS = [
  {
    name: 'ip',
    unit: psy.IP,
    freeze: 32.0,             // psychrometer-equation switch (FREEZING_POINT_WATER_IP)
    elevations: [0, 1000, 5280, 10000],                 // ft
    dryBulbs: [-20, -10].concat(range(0, 120, 5)),      // degF
    depressions: [0, 1, 2, 5, 10, 15, 20, 30],          // degF
    pressureOut: (p) => p,                              // psia
    enthalpyOut: (h) => h,                              // Btu/lb dry air
  },
  {
    name: 'si',
    unit: psy.SI,
    freeze: 0.0,              // FREEZING_POINT_WATER_SI
    elevations: [0, 300, 1600, 3000],                   // m
    dryBulbs: range(-20, 50, 2.5),                      // degC
    depressions: [0, 0.5, 1, 3, 5, 8, 12, 16],          // K
    pressureOut: (p) => p / 1000,                       // Pa -> kPa
    enthalpyOut: (h) => h / 1000,                       // J/kg -> kJ/kg dry air
  },
];

const REL_HUMS = [5, 10, 20, 30, 40, 50, 60, 70, 80, 90, 95, 100]; // percent

// ---- self-check helpers (use only PsychroLib's public functions) ------------------

// All wet-bulb roots of GetHumRatioFromTWetBulb(db, t, p) == w on [tdp, db].
// The psychrometer equation switches formula at `freeze` and jumps DOWN there,
// so each branch is monotonic and a given W can have two roots.
function wetBulbRoots(db, w, p, tdp, freeze) {
  const f = (t) => psy.GetHumRatioFromTWetBulb(db, t, p) - w;
  const bisect = (lo, hi) => {
    for (let i = 0; i < 200 && hi - lo > 1e-12; i++) {
      const mid = (lo + hi) / 2;
      if (f(mid) > 0) hi = mid; else lo = mid;
    }
    return (lo + hi) / 2;
  };
  const segs = [];
  const lo = Math.min(tdp, db) - 0.5; // margin: tdp itself is only good to the NR tolerance
  if (lo < freeze && db >= freeze) {
    // ice branch [lo, freeze) and water branch [freeze, db]
    const justBelow = freeze - 1e-9;
    segs.push([lo, justBelow], [freeze, db]);
  } else {
    segs.push([lo, db]);
  }
  const roots = [];
  for (const [a, b] of segs) {
    const fa = f(a), fb = f(b);
    const eps = 1e-13 * w; // saturation rows: f(db) is 0 up to rounding
    if (Math.abs(fa) <= eps) roots.push(a);
    else if (Math.abs(fb) <= eps) roots.push(b);
    else if (fa < 0 && fb > 0) roots.push(bisect(a, b));
  }
  return roots;
}

// Tight inverse of GetSatVapPres (dew/frost point) by bisection, for checking the NR solver.
function dewPointTight(pw, db, lowBound) {
  let lo = lowBound, hi = db;
  if (psy.GetSatVapPres(hi) <= pw) return db; // PsychroLib also returns min(Tdp, db)
  for (let i = 0; i < 200 && hi - lo > 1e-12; i++) {
    const mid = (lo + hi) / 2;
    if (psy.GetSatVapPres(mid) > pw) hi = mid; else lo = mid;
  }
  return (lo + hi) / 2;
}

// ---- grid -------------------------------------------------------------------------

const HEADER = 'units,case,elevation,pressure,dry_bulb,input_kind,input_value,' +
  'wet_bulb,dew_point,rel_hum_pct,hum_ratio,enthalpy,volume';
const lines = [HEADER];
const log = (s) => process.stderr.write(s + '\n');

for (const sys of SYSTEMS) {
  psy.SetUnitSystem(sys.unit); // also resets PsychroLib's internal tolerance for this system
  const lowBound = sys.name === 'ip' ? -148 : -100;
  const stats = { rows: 0, wb: 0, rh: 0, skipped: 0, skipReasons: {}, maxWbErr: 0, maxWbErrCase: '',
    maxDpErr: 0, maxDpErrCase: '', twoRoots: [] };
  const skip = (id, why) => {
    stats.skipped++;
    stats.skipReasons[why] = (stats.skipReasons[why] || 0) + 1;
  };

  for (const elev of sys.elevations) {
    const p = psy.GetStandardAtmPressure(elev);
    for (const db of sys.dryBulbs) {
      const base = `${sys.name}_e${elev}_db${db}`;

      const emit = (id, kind, input, wb, dp, rhPct, w, h, v) => {
        // self-checks
        const pw = psy.GetVapPresFromHumRatio(w, p);
        const dpErr = Math.abs(dp - dewPointTight(pw, db, lowBound));
        if (dpErr > stats.maxDpErr) { stats.maxDpErr = dpErr; stats.maxDpErrCase = id; }
        const roots = wetBulbRoots(db, w, p, dp, sys.freeze);
        let tag = '';
        if (roots.length > 1) {
          tag = '_twowb';
          stats.twoRoots.push(`${id}: returned wb=${wb.toFixed(4)}, roots=[${roots.map((r) => r.toFixed(4)).join(', ')}]`);
        }
        if (kind === 'rel_hum' && roots.length > 0) {
          const err = Math.min(...roots.map((r) => Math.abs(r - wb)));
          if (err > stats.maxWbErr) { stats.maxWbErr = err; stats.maxWbErrCase = id; }
        }
        lines.push([sys.name, id + tag, num(elev), num(sys.pressureOut(p)), num(db), kind, num(input),
          num(wb), num(dp), num(rhPct), num(w), num(sys.enthalpyOut(h)), num(v)].join(','));
        stats.rows++;
        stats[kind === 'wet_bulb' ? 'wb' : 'rh']++;
      };

      // input_kind wet_bulb: input_value is the wet-bulb temperature (db - depression)
      for (const d of sys.depressions) {
        const id = `${base}_wbd${d}`;
        const wb = db - d;
        try {
          const w = psy.GetHumRatioFromTWetBulb(db, wb, p);
          if (!(w > MIN_HUM_RATIO)) { skip(id, 'W<=0 (PsychroLib clamped to 1e-7)'); continue; }
          // Not clamped to 100 %: saturation rows can read 100.00000000000002 (rounding), and IP
          // rows with wb = db < 32 F read 99.990..100.007 % (ASHRAE IP ice-psychrometer coefficients).
          const rh = psy.GetRelHumFromHumRatio(db, w, p);
          const dp = psy.GetTDewPointFromHumRatio(db, w, p);
          const h = psy.GetMoistAirEnthalpy(db, w);
          const v = psy.GetMoistAirVolume(db, w, p);
          emit(id, 'wet_bulb', wb, wb, dp, rh * 100, w, h, v);
        } catch (e) {
          skip(id, 'threw: ' + e.message);
        }
      }

      // input_kind rel_hum: input_value is RH in percent
      for (const rhPct of REL_HUMS) {
        const id = `${base}_rh${rhPct}`;
        const rh = rhPct / 100;
        try {
          const w = psy.GetHumRatioFromRelHum(db, rh, p);
          const wb = psy.GetTWetBulbFromRelHum(db, rh, p);
          const dp = psy.GetTDewPointFromRelHum(db, rh);
          const h = psy.GetMoistAirEnthalpy(db, w);
          const v = psy.GetMoistAirVolume(db, w, p);
          emit(id, 'rel_hum', rhPct, wb, dp, rhPct, w, h, v);
        } catch (e) {
          skip(id, 'threw: ' + e.message);
        }
      }
    }
  }

  log(`[${sys.name}] rows=${stats.rows} (wet_bulb=${stats.wb}, rel_hum=${stats.rh}) skipped=${stats.skipped}`);
  for (const [why, n] of Object.entries(stats.skipReasons)) log(`[${sys.name}]   skipped ${n}: ${why}`);
  log(`[${sys.name}] max |wet_bulb - nearest exact root| (rel_hum rows) = ${stats.maxWbErr.toExponential(3)} at ${stats.maxWbErrCase}`);
  log(`[${sys.name}] max |dew_point - exact inverse of GetSatVapPres| = ${stats.maxDpErr.toExponential(3)} at ${stats.maxDpErrCase}`);
  log(`[${sys.name}] rows with two wet-bulb roots (case suffix _twowb): ${stats.twoRoots.length}`);
  for (const s of stats.twoRoots) log(`[${sys.name}]   ${s}`);
}

process.stdout.write(lines.join('\n') + '\n');
