#!/usr/bin/env node
/*
 * make-return-leak-cases.js — writes return-leak-cases.json, outside reference values for the
 * Latent Ledger return-duct leak fraction tests.
 *
 * A return plenum receives house air from the return grille and a known dry-air mass fraction f of
 * attic or crawlspace air through a leak. The plenum state is computed here, independently of the
 * Java code, by ASHRAE Handbook—Fundamentals 2017/2021 ch. 1, "Adiabatic mixing of two streams of
 * moist air" (dry-air, water and energy balances on a dry-air basis):
 *   W_p = (1 - f) W_g + f W_a,   h_p = (1 - f) h_g + f h_a,   t_p = t(h_p, W_p)
 * with every property from PsychroLib 2.5.0 (JavaScript; npm psychrolib@1.1.1), SI, as shipped:
 *   D. Meyer and D. Thevenard (2019), J. Open Source Software 4(33), 1137.
 * The test reads the plenum's dry bulb and dew point as a tech would and recovers f.
 *
 * Regenerate (node >= 14; keep node_modules OUT of this repository):
 *   mkdir -p /tmp/psl-house && cd /tmp/psl-house && npm init -y && npm install psychrolib@1.1.1
 *   cd <repo>/src/test/resources/reference/house
 *   NODE_PATH=/tmp/psl-house/node_modules node make-return-leak-cases.js > return-leak-cases.json
 * Output is deterministic.
 */
'use strict';
const psy = require('psychrolib');
psy.SetUnitSystem(psy.SI);
const fToC = (f) => (f - 32) / 1.8;
const p = 101325;

function state(db, kind, value) {
  let W;
  if (kind === 'rh') W = psy.GetHumRatioFromRelHum(db, value / 100, p);
  else if (kind === 'dp') W = psy.GetHumRatioFromTDewPoint(value, p);
  else throw new Error(kind);
  return { db, W, h: psy.GetMoistAirEnthalpy(db, W) };
}

const cases = [];
const grilles = [[fToC(75), 'rh', 50], [fToC(72), 'rh', 58], [fToC(78), 'dp', fToC(60)]];
const spaces = [[fToC(115), 'dp', fToC(74)], [fToC(85), 'dp', fToC(70)], [fToC(130), 'dp', fToC(78)]];
const fractions = [0.02, 0.08, 0.15, 0.30];
let n = 0;
for (const g of grilles) {
  for (const a of spaces) {
    for (const f of fractions) {
      const sg = state(...g);
      const sa = state(...a);
      const W = (1 - f) * sg.W + f * sa.W;
      const h = (1 - f) * sg.h + f * sa.h;
      const db = psy.GetTDryBulbFromEnthalpyAndHumRatio(h, W);
      cases.push({
        id: 'leak-' + (++n), pressurePa: p, fraction: f,
        grilleDb: sg.db, grilleDewPoint: psy.GetTDewPointFromHumRatio(sg.db, sg.W, p), grilleW: sg.W,
        spaceDb: sa.db, spaceDewPoint: psy.GetTDewPointFromHumRatio(sa.db, sa.W, p), spaceW: sa.W,
        plenumDb: db, plenumDewPoint: psy.GetTDewPointFromHumRatio(db, W, p), plenumW: W,
      });
    }
  }
}
process.stdout.write(JSON.stringify({
  generator: 'make-return-leak-cases.js with PsychroLib 2.5.0 (npm psychrolib@1.1.1), SI units',
  cases,
}, null, 2) + '\n');
