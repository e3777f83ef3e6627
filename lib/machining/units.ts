// Exact conversion factors (NIST SP 811, appendix B). Pound-force uses standard gravity.
export const MM_PER_INCH = 25.4;
export const M_PER_FOOT = 0.3048;
export const MM_PER_FOOT = 304.8;
export const KG_PER_POUND = 0.45359237;
export const STANDARD_GRAVITY = 9.80665;
export const N_PER_LBF = KG_PER_POUND * STANDARD_GRAVITY; // 4.4482216152605
/** Mechanical horsepower, 550 ft·lbf/s = 745.69987158227022 W. */
export const W_PER_HP = 550 * M_PER_FOOT * N_PER_LBF;
export const KW_PER_HP = W_PER_HP / 1000;
export const NM_PER_LBF_FT = N_PER_LBF * M_PER_FOOT;
export const CM3_PER_IN3 = 16.387064;
export const NMM2_PER_PSI = N_PER_LBF / (MM_PER_INCH * MM_PER_INCH);

export const mmToIn = (mm: number) => mm / MM_PER_INCH;
export const inToMm = (inch: number) => inch * MM_PER_INCH;
/** Feed rate: mm/min ↔ in/min. */
export const mmMinToInMin = (mmMin: number) => mmMin / MM_PER_INCH;
export const inMinToMmMin = (inMin: number) => inMin * MM_PER_INCH;
/** Cutting speed: m/min ↔ surface feet per minute (SFM). */
export const mpmToSfm = (mpm: number) => mpm / M_PER_FOOT;
export const sfmToMpm = (sfm: number) => sfm * M_PER_FOOT;
export const kwToHp = (kw: number) => kw / KW_PER_HP;
export const hpToKw = (hp: number) => hp * KW_PER_HP;
export const nToLbf = (n: number) => n / N_PER_LBF;
export const lbfToN = (lbf: number) => lbf * N_PER_LBF;
export const nmToLbfFt = (nm: number) => nm / NM_PER_LBF_FT;
export const lbfFtToNm = (lbfFt: number) => lbfFt * NM_PER_LBF_FT;
export const cm3ToIn3 = (cm3: number) => cm3 / CM3_PER_IN3;
export const in3ToCm3 = (in3: number) => in3 * CM3_PER_IN3;
export const nmm2ToPsi = (nmm2: number) => nmm2 / NMM2_PER_PSI;
export const psiToNmm2 = (psi: number) => psi * NMM2_PER_PSI;
