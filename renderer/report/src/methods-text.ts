// The "Methods and assumptions" section's notes in plain words, summarising docs/methods/*.md. The
// models and their citations come from the model registry (schedules/words/model-words.ts); the
// conversion constant is the one of docs/methods/circadian.md §2 (melanopic DER of CIE FL2,
// computed from the CIE tables).

export const UNIT_NOTES: readonly string[] = [
  'Light at the eye is kept as melanopic EDI (lx) for each source — daylight, electric light, screens, outdoors — until the last step; asleep, the models read the light that passes the closed eyelids.',
  'The body-clock models were fitted to photopic lux of cool-white fluorescent light; melanopic EDI is converted once: model lux = melanopic EDI ÷ 0.569, the melanopic DER of CIE illuminant FL2.',
  'Times are local clock times at the site; the run follows the daylight-saving changes of the site’s time zone.',
  'DLMO, the dim-light melatonin onset, is the evening time at which melatonin would rise above 10 pg/mL in dim light; CBTmin is the time of the body’s temperature low. Both mark where the body clock stands.',
  'KSS is the Karolinska Sleepiness Scale from 1 (extremely alert) to 9 (very sleepy); 7 or more (“sleepy, but no effort to keep awake”) counts as sleepy.',
];

export const NOT_MODELLED: readonly string[] = [
  'Individual differences beyond the persona settings (a cohort run samples period, light sensitivity, age and sleep timing).',
  'Pupil size, gaze changes within a segment, self-shading by the body, hats and street-level obstructions outdoors.',
  'Caffeine, alcohol, medication, meals, exercise and noise as influences on the body clock or sleep.',
  'Clinical conditions (sleep disorders, depression, eye disease) and therapy with light.',
  'Visual comfort, glare and photobiological safety of the lighting.',
];
