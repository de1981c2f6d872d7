/**
 * Between-person spreads of the traits a virtual cohort varies, with their published sources.
 * Each spread is centred on the persona's own value, so a cohort describes "people like this
 * persona" rather than a whole population. Derivations are written out in docs/methods/cohort.md.
 */

/**
 * Intrinsic circadian period, SD between people [h].
 * Duffy JF et al. "Sex difference in the near-24-hour intrinsic period of the human circadian
 * timing system", PNAS 108 Suppl 3:15602–15608 (2011), abstract: 157 people aged 18–74 in a
 * forced-desynchrony protocol, 24.15 ± 0.2 h (mean ± SD). The population mean 24.18 h is
 * Czeisler CA et al., Science 284:2177–2181 (1999), abstract; its abstract gives no SD.
 */
export const INTRINSIC_PERIOD_SD_H = 0.2;
/** Population mean intrinsic period [h]: Czeisler et al. 1999, abstract ("averages 24.18 hours"). */
export const POPULATION_INTRINSIC_PERIOD_MEAN_H = 24.18;

/**
 * Light sensitivity: SD of the natural log of a multiplier on the light input of the model.
 * Phillips AJK et al. "High sensitivity and interindividual variability in the response of the
 * human circadian system to evening light", PNAS 116(24):12019–12024 (2019): 55 adults; the
 * illuminance for 50 % melatonin suppression (ED50) ranged from 6 lx (most sensitive) to 350 lx
 * (least), group ED50 24.6 lx (PNAS press summary of the paper; "> 50-fold" in its significance
 * statement). Taking ln ED50 as normal, the expected range of 55 standard-normal draws is
 * 4.572 SD (computed: ∫(1 − Φⁿ − (1 − Φ)ⁿ) dx, n = 55), so σ_ln = ln(350/6) / 4.572 = 0.889.
 */
export const LIGHT_SENSITIVITY_SD_LN = 0.889;
/** Group ED50 of melatonin suppression for 5 h of evening light [lx], Phillips et al. 2019. */
export const PHILLIPS_2019_GROUP_ED50_LX = 24.6;
/** Most and least sensitive individual ED50 [lx], Phillips et al. 2019 (n = 55). */
export const PHILLIPS_2019_ED50_RANGE_LX = [6, 350] as const;
export const PHILLIPS_2019_PARTICIPANTS = 55;

/**
 * Habitual sleep timing: SD of mid-sleep between people [h].
 * Santisteban JA, Brown TG, Gruber R. "Association between the Munich Chronotype Questionnaire
 * and wrist actigraphy", Sleep Disorders 2018:5646848, abstract: sleep-corrected mid-sleep on
 * free days 4:56 ± 1:16 (MCTQ) and 4:51 ± 1:23 (actigraphy), 115 adults aged 18–34.
 * Cross-check: the MCTQ population histogram of Roenneberg and colleagues (as reproduced on a
 * public page, 0.5 h bins) gives SD 1.27 h by our computation (docs/methods/cohort.md).
 */
export const HABITUAL_MID_SLEEP_SD_H = 1.27;

/** Draws are truncated at this many SDs (common practice, keeps every trait physiological). */
export const TRUNCATION_SD = 4;
