/**
 * The published sources of the welded-detail core, one string each, so that every function
 * cites the same words. Clause, equation and table numbers that rest on recollection rather
 * than on a looked-up copy say "from memory"; the tests repeat that marker beside each check.
 */

/** EN 1993-1-9:2005 (Eurocode 3, Part 1-9: Fatigue), with corrigenda. */
export const EN1993_1_9 = 'EN 1993-1-9:2005, Eurocode 3: Design of steel structures, Part 1-9: Fatigue';

export const EN_CURVE_SOURCE =
  EN1993_1_9 +
  ', Sec. 7.1, Eqs. (7.1) to (7.3), Figs. 7.1 and 7.2: ' +
  'Delta sigma_R^m N_R = Delta sigma_C^m 2e6 with m = 3 for N <= 5e6; ' +
  'Delta sigma_D = (2/5)^(1/3) Delta sigma_C = 0.737 Delta sigma_C (constant-amplitude fatigue limit, 5e6); ' +
  'Delta sigma_R^m N_R = Delta sigma_D^m 5e6 with m = 5 for 5e6 <= N <= 1e8; ' +
  'Delta sigma_L = (5/100)^(1/5) Delta sigma_D = 0.549 Delta sigma_D (cut-off limit, 1e8); ' +
  'shear: Delta tau_R^m N_R = Delta tau_C^m 2e6 with m = 5 for N <= 1e8, Delta tau_L = (2/100)^(1/5) Delta tau_C = 0.457 Delta tau_C; ' +
  'definitions of the constant-amplitude fatigue limit and the cut-off limit: Sec. 1.3.3.3, 1.3.3.4';

export const IIW_2016 =
  'Hobbacher, Recommendations for Fatigue Design of Welded Joints and Components, IIW document XIII-2460-13, 2nd ed., Springer 2016';
export const IIW_2008 =
  'Hobbacher, Recommendations for Fatigue Design of Welded Joints and Components, IIW document IIW-1823-07 (ex XIII-2151r4-07/XV-1254r4-07), Dec. 2008 (also WRC Bulletin 520, 2009)';

export const IIW_CURVE_SOURCE_2016 =
  IIW_2016 +
  ', Sec. 3.2 (from memory): FAT = characteristic range at 2e6 cycles; m = 3 (normal stress) with the knee at 1e7 cycles, ' +
  'm = 5 (shear) with the knee at 1e8 cycles; beyond the knee the curve continues with m = 22 ' +
  '(about 10 % per decade); steel and aluminium alike';
export const IIW_CURVE_SOURCE_2008 =
  IIW_2008 +
  ', Sec. 3.2 and 4.3.1 (from memory): FAT at 2e6 cycles; m = 3 (normal stress) with the knee at 1e7, ' +
  'm = 5 (shear) with the knee at 1e8; constant amplitude: no damage below the knee (fatigue limit); ' +
  'variable amplitude: the curve continues below the knee with m2 = 2 m - 1 (Haibach), no cut-off';

export const EN_SIZE_SOURCE =
  EN1993_1_9 +
  ', Sec. 7.2.2 (from memory: clause number): Delta sigma_C,red = ks Delta sigma_C; ks = (25/t)^0.2 for t > 25 mm, ' +
  'for the details whose table entry names the size effect (e.g. Table 8.3 transverse butt welds); no increase for t <= 25 mm';
export const IIW_THICKNESS_SOURCE =
  IIW_2016 +
  ', Sec. 3.5.2, Table 3.5-1 (from memory): f(t) = (t_ref / t_eff)^n, t_ref = 25 mm, ' +
  'n = 0.3 (cruciform and T-joints, transverse attachments, ends of longitudinal stiffeners, as welded), ' +
  '0.2 (the same, toe ground; transverse butt welds as welded), 0.1 (butt welds ground flush, base material, longitudinal welds and attachments); ' +
  'applies for t > t_ref only';

export const IIW_RATIO_SOURCE =
  IIW_2016 +
  ', Sec. 3.3.4 "Enhancement factor f(R)" (from memory; the same in ' +
  IIW_2008 +
  ' Sec. 3.3.4): case I stress-relieved or negligible residual stress: f(R) = 1.6 for R < -1, -0.4 R + 1.2 for -1 <= R <= 0.5, 1 for R > 0.5; ' +
  'case II small-scale thin-walled elements with short welds: f(R) = 1.3 for R < -1, -0.4 R + 0.9 for -1 <= R <= -0.25, 1 for R > -0.25; ' +
  'case III complex welded components, global residual stresses, thick walls (as welded): f(R) = 1';
export const EN_COMPRESSIVE_SOURCE =
  EN1993_1_9 +
  ', Sec. 7.2.1(1)-(2), Fig. 7.3 (from memory: clause and figure number): for non-welded or stress-relieved welded details ' +
  'the effective range is the tensile part plus 60 % of the magnitude of the compressive part; as-welded details: the full range';

export const IIW_IMPROVEMENT_SOURCE =
  'Haagensen & Maddox, IIW Recommendations on Methods for Improving the Fatigue Strength of Welded Joints, IIW document XIII-2200r7-07, Woodhead 2013; ' +
  IIW_2008 +
  ', Sec. 3.6, Table 3.6-1 (from memory): benefit factor on FAT at 2e6 cycles, m = 3: burr grinding and TIG dressing 1.3; ' +
  'hammer and needle peening 1.3 for fy < 355 MPa, 1.5 for fy >= 355 MPa and aluminium; applies to toe failure of details with FAT <= 90 (steel) ' +
  'or FAT <= 32 (aluminium); improved class at most FAT 112 (steel) or FAT 45 (aluminium)';
export const HFMI_SOURCE =
  'Marquis & Barsoum, IIW Recommendations for the HFMI Treatment for Improving the Fatigue Strength of Welded Joints, Springer 2016 ' +
  '(from memory): the class rises by FAT steps with the yield strength, 3 steps for 235 < fy <= 355 MPa and one more per band ' +
  '355-550, 550-750, 750-950, above 950 MPa; slope m = 5; stress ratio: no reduction for R <= 0.15, one step less for R <= 0.28, ' +
  'two for R <= 0.4, three for R <= 0.52, no recommendation above 0.52';
export const EN_IMPROVEMENT_SOURCE =
  EN1993_1_9 +
  ', Sec. 1.1(6): post-fabrication treatments to improve the fatigue strength other than stress relief are not covered';

export const HOT_SPOT_SOURCE =
  IIW_2016 +
  ', Sec. 2.2.3.4 (from memory: section number), surface extrapolation to the weld toe: type a, fine mesh or strain gauges: ' +
  'sigma_hs = 1.67 sigma(0.4t) - 0.67 sigma(1.0t); quadratic: sigma_hs = 2.52 sigma(0.4t) - 2.24 sigma(0.9t) + 0.72 sigma(1.4t); ' +
  'coarse mesh: sigma_hs = 1.50 sigma(0.5t) - 0.50 sigma(1.5t); type b: sigma_hs = 3 sigma(4 mm) - 3 sigma(8 mm) + sigma(12 mm); ' +
  'coarse mesh: sigma_hs = 1.50 sigma(5 mm) - 0.50 sigma(15 mm)';
export const HOT_SPOT_CLASS_SOURCE =
  IIW_2016 +
  ', Sec. 3.3.2, Table 3.3-1 (from memory): structural hot-spot classes FAT 100 (butt joints, non-load-carrying fillet welds, attachment ends, cover plate ends) ' +
  'and FAT 90 (load-carrying fillet welds); aluminium FAT 40 and FAT 36';
export const NOTCH_SOURCE =
  'Fricke, IIW Guideline for the Fatigue Assessment by Notch Stress Analysis for Welded Structures, IIW document XIII-2240r2-08/XV-1289r2-08 (2008), ' +
  'and ' +
  IIW_2016 +
  ', Sec. 3.4 (from memory): effective notch stress with the reference radius r_ref = 1 mm (plates t >= 5 mm): ' +
  'FAT 225 steel, FAT 71 aluminium with the maximum principal stress; FAT 200 steel, FAT 63 aluminium with the von Mises stress; m = 3';

export const THROAT_SOURCE =
  IIW_2016 +
  ', Sec. 2.2.2 and Table 3.2-1 (from memory: detail numbers): load-carrying fillet welds are assessed on the weld throat, ' +
  'Delta sigma_w = sqrt(Delta sigma_perp^2 + Delta tau_perp^2) = Delta F_perp / (n a) for a force per length carried by n throats of size a; ' +
  'root failure of cruciform and T-joints FAT 36 (aluminium FAT 12), m = 3; shear along the throat Delta tau_w = Delta F_par / (n a), FAT 80, m = 5; ' +
  EN1993_1_9 +
  ', Table 8.5 detail 3 (root failure, Delta sigma_w on the throat, category 36*) and detail 8 (shear flow, Delta tau_w, category 80, m = 5) (from memory)';

export const EN_GAMMA_SOURCE =
  EN1993_1_9 +
  ', Sec. 3(7) and Table 3.1 (recommended values; a National Annex may set others): gamma_Mf = 1.00 damage tolerant / low consequence, ' +
  '1.15 damage tolerant / high consequence, 1.15 safe life / low consequence, 1.35 safe life / high consequence; gamma_Ff = 1.0';
export const IIW_GAMMA_SOURCE =
  IIW_2016 +
  ', Sec. 6.3 (from memory: table and values): gamma_M = 1.00 damage tolerant / non-hazardous, 1.15 damage tolerant / hazardous, ' +
  '1.15 safe life / non-hazardous, 1.30 safe life / hazardous';

export const EN_VERIFICATION_SOURCE =
  EN1993_1_9 +
  ', Sec. 8, Eqs. (8.2) and (8.3): gamma_Ff Delta sigma_E,2 / (Delta sigma_C / gamma_Mf) <= 1.0, the same for shear; ' +
  'interaction (gamma_Ff Delta sigma_E,2 / (Delta sigma_C / gamma_Mf))^3 + (gamma_Ff Delta tau_E,2 / (Delta tau_C / gamma_Mf))^5 <= 1.0';
export const EN_RANGE_LIMIT_SOURCE =
  EN1993_1_9 +
  ', Sec. 8(1), Eq. (8.1): Delta sigma <= 1.5 fy, Delta tau <= 1.5 fy / sqrt(3) (nominal ranges)';
export const IIW_RANGE_LIMIT_SOURCE =
  IIW_2016 +
  ', Sec. 3.2.1 and 3.3 (from memory): nominal Delta sigma <= 1.5 fy, Delta tau <= 1.5 fy / sqrt(3); structural hot-spot Delta sigma <= 2 fy';
export const IIW_INTERACTION_SOURCE =
  IIW_2016 +
  ', Sec. 4.3.3 (from memory: section number): (Delta sigma_S,d / Delta sigma_R,d)^2 + (Delta tau_S,d / Delta tau_R,d)^2 <= CV, ' +
  'CV = 1.0 for proportional, 0.5 for non-proportional loading';

export const EN_DAMAGE_SOURCE =
  EN1993_1_9 +
  ', Annex A, Eq. (A.1) (from memory: equation number): D_d = sum(n_Ei / N_Ri) <= 1.0 on the design curve (ranges gamma_Ff Delta sigma_i, ' +
  'curve Delta sigma_C / gamma_Mf), m = 3 above Delta sigma_D, m = 5 down to Delta sigma_L, no damage below Delta sigma_L';
export const IIW_DAMAGE_SOURCE =
  IIW_2016 +
  ', Sec. 4.3.1 (from memory): Palmgren-Miner sum on the design curve; permissible damage sum D = 0.5 in general, ' +
  'D = 0.2 for non-proportional loading';
export const EQUIVALENT_RANGE_SOURCE =
  'Equivalent constant-amplitude range at N_C = 2e6 cycles: the range whose 2e6 cycles do the damage D on the m1 branch of the curve, ' +
  'Delta sigma_E,2 = (Delta sigma_C / (gamma_Mf gamma_Ff)) D^(1/m1), so that the verification gamma_Ff Delta sigma_E,2 <= Delta sigma_C / gamma_Mf ' +
  'holds exactly when D <= 1 (' +
  EN1993_1_9 +
  ', Sec. 6.2 and Sec. 8, definition of Delta sigma_E,2; the same construction as ' +
  IIW_2016 +
  ', Sec. 4.3.1, from memory)';
