// The "Methods and assumptions" section in plain words, summarising docs/methods/*.md. Every
// model carries the citation given there; the conversion constant is the one of
// docs/methods/circadian.md §2 (melanopic DER of CIE FL2, computed from the CIE tables).

export interface ModelEntry {
  readonly what: string;
  readonly model: string;
  readonly reference: string;
  readonly units: string;
}

export const MODELS: readonly ModelEntry[] = [
  { what: 'Sun position', model: 'NREL Solar Position Algorithm', reference: 'Reda & Andreas 2004, Solar Energy 76:577', units: 'degrees; topocentric, refraction-corrected' },
  { what: 'Sky and daylight through windows', model: 'CIE standard general sky; window form factors; split-flux inter-reflection', reference: 'CIE S 011/E:2003; EnergyPlus Engineering Reference', units: 'lx (photopic), W/m² spectral' },
  { what: 'α-opic quantities at the eye', model: 'CIE S 026 α-opic toolbox quantities with lens ageing', reference: 'CIE S 026/E:2018', units: 'melanopic EDI in lx; α-opic irradiance in mW/m²' },
  { what: 'Recommendation bands', model: 'Daytime ≥ 250 lx, evening ≤ 10 lx, sleep ≤ 1 lx melanopic EDI', reference: 'Brown et al. 2022, PLOS Biology 20:e3001571', units: 'melanopic EDI, lx' },
  { what: 'Light processing and body clock', model: 'Kronauer-family x⁷ oscillator with the St Hilaire et al. 2007 light processing (default jfk99-x7-sh07), chosen against the published dose and phase response to light', reference: 'Jewett, Forger & Kronauer 1999, J Biol Rhythms 14:493; St Hilaire et al. 2007, J Theor Biol 247:583', units: 'model-native photopic lux of cool-white fluorescent light; hours' },
  { what: 'Phase markers', model: 'CBTmin from the oscillator minimum; DLMO: the modelled melatonin in dim light (without suppression) rising through 10 pg/mL, as a clinic measures it', reference: 'docs/methods/circadian.md §4.4', units: 'clock hours' },
  { what: 'Melatonin and suppression', model: 'Pineal synthesis and clearance driven by the clock, suppressed by light', reference: 'St Hilaire, Gronfier, Zeitzer & Klerman 2007, J Pineal Res 43:294', units: 'pmol/L; suppression in % against the same person in dim light, over the awake hours of the biological night' },
  { what: 'Sleepiness (headline)', model: 'Three-process model of alertness: sleep pressure, circadian rhythm tied to the simulated body clock, sleep inertia; converted to KSS', reference: 'Åkerstedt & Folkard 1997, Chronobiol Int 14:115; Åkerstedt, Folkard & Portin 2004; Ingre et al. 2014, PLoS ONE 9:e108679', units: 'KSS 1 (extremely alert) … 9 (very sleepy)' },
  { what: 'Sleepiness (second model)', model: 'Sleep–wake switch with homeostatic pressure; KSS from pressure and circadian drive, plus sleep inertia', reference: 'Postnova, Lockley & Robinson 2018, J Biol Rhythms 33:203', units: 'KSS 1 … 9' },
  { what: 'Numerical solution', model: 'Adaptive extrapolation ODE solver, restarted at light changes', reference: 'Hairer & Wanner, ODEX (odex package)', units: '—' },
];

export const UNIT_NOTES: readonly string[] = [
  'Light at the eye is kept as melanopic EDI (lx) per source until the last step.',
  'The body-clock models were fitted to photopic lux of cool-white fluorescent light; melanopic EDI is converted once: native lux = melanopic EDI ÷ 0.569, the melanopic DER of CIE illuminant FL2.',
  'Times are local clock times at the site; the run follows daylight-saving changes of the site’s time zone.',
  'A phase advance (earlier clock time) is reported as a positive shift, as is common in circadian research.',
  'KSS ≥ 7 (“sleepy, but no effort to keep awake”) is used as the threshold for sleepy hours (common practice).',
];

export const NOT_MODELLED: readonly string[] = [
  'Individual differences beyond the persona settings (a cohort run samples period, light sensitivity, age and sleep timing).',
  'Pupil size, gaze changes within a segment, self-shading by the body, hats and street-level obstructions outdoors.',
  'Caffeine, alcohol, medication, meals, exercise and noise as influences on the body clock or sleep.',
  'Clinical conditions (sleep disorders, depression, eye disease) and therapy with light.',
  'Visual comfort, glare and photobiological safety of the lighting.',
];
