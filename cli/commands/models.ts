/**
 * `zeitlight models [--json]` — the body-clock models this version can run, with their
 * parameter sets, phase-marker rules and sources, and the sleepiness (KSS) models with the
 * headline one marked.
 */
import type { Command, CommandContext } from '../command.js';
import { formatTable, HEALTH_CAUTION, printJson } from '../output.js';
import { MELATONIN_OUTPUT_DEFINITIONS } from '../../model/circadian/body-clock.js';
import { calibrationMelanopicDer, CALIBRATION_ILLUMINANT } from '../../model/circadian/calibration.js';
import { ST_HILAIRE_MELATONIN } from '../../model/circadian/melatonin-sthilaire.js';
import { MELATONIN_PROCESS_L } from '../../model/circadian/melatonin-pass.js';
import { createPacemaker, DEFAULT_ENSEMBLE_PACEMAKERS, DEFAULT_PACEMAKER_ID, PACEMAKER_IDS } from '../../model/circadian/registry.js';
import { HCL_PRESETS } from '../../model/circadian/sleep-switch-hcl.js';
import { HEADLINE_SLEEPINESS_ID, SLEEPINESS_MODEL_IDS, SLEEPINESS_MODELS } from '../../model/circadian/sleepiness-registry.js';

export const modelsCommand: Command = {
  name: 'models',
  summary: 'List the body-clock models, their parameter sets and sources',
  usage: '[--json]',
  options: {},
  async run(ctx: CommandContext): Promise<number> {
    const pacemakers = PACEMAKER_IDS.map((id) => {
      const m = createPacemaker(id);
      const { source: processLSource, ...processL } = m.processL;
      return {
        id,
        default: id === DEFAULT_PACEMAKER_ID,
        ensemble: DEFAULT_ENSEMBLE_PACEMAKERS.includes(id),
        label: m.label,
        source: m.source,
        state: m.stateNames,
        parameters: m.parameters,
        process_l: { ...processL, source: processLSource },
        intrinsic_period_h: Math.round(m.tau_h * 10000) / 10000,
        cbtmin_rule: m.marker.kind === 'x-min' ? `time of the x minimum + ${m.marker.cbtminOffset_h} h` : 'time at which ψ ≡ π',
        dlmo_rule: MELATONIN_OUTPUT_DEFINITIONS.dlmo_h,
      };
    });
    const doc = {
      pacemakers,
      melatonin: { id: 'sthilaire07-melatonin', source: 'St Hilaire, Gronfier, Zeitzer & Klerman 2007 J Pineal Res 43:294', parameters: ST_HILAIRE_MELATONIN, suppression_process_l: MELATONIN_PROCESS_L, suppression_definition: MELATONIN_OUTPUT_DEFINITIONS.melatonin_suppression_pct },
      sleepiness: SLEEPINESS_MODEL_IDS.map((id) => {
        const m = SLEEPINESS_MODELS[id];
        return { id, headline: id === HEADLINE_SLEEPINESS_ID, label: m.label, source: m.source, parameters: m.parameters };
      }),
      free_sleep: { id: 'hcl23', source: 'Skeldon et al. 2023/24 PLoS Comput Biol (Homeostatic–Circadian–Light model, authors\' code)', presets: HCL_PRESETS },
      light_input: {
        native: 'photopic lux of cool-white fluorescent light (the models\' calibration source)',
        melanopic: `melanopic EDI is divided by the melanopic DER of CIE ${CALIBRATION_ILLUMINANT} = ${calibrationMelanopicDer().toFixed(4)}`,
        sleep_gating: 'asleep, the models read the light behind the closed eyelids (adult closed-eyelid spectral transmittance, Ando & Kripke 1996 and Robinson et al. 1991; for a bare light series 0.30 % of the melanopic EDI, the value for the calibration source CIE FL2)',
      },
      person_parameters: {
        tau_h: 'intrinsic (free-running) period in darkness, h',
        lightSensitivity: 'multiplier on the native-lux input before Process L (1 = published model)',
      },
      caution: HEALTH_CAUTION,
    };
    if (ctx.json) {
      printJson(ctx, doc);
      return 0;
    }
    ctx.stdout(formatTable(['id', 'period h', 'CBTmin rule', 'model'], pacemakers.map((p) => [p.id + (p.default ? ' *' : ''), p.intrinsic_period_h.toFixed(2), p.cbtmin_rule, p.label])));
    ctx.stdout(`\n* default. Melatonin: ${doc.melatonin.source}.\n\n`);
    ctx.stdout(formatTable(['sleepiness id', 'model', 'source'], doc.sleepiness.map((m) => [m.id + (m.headline ? ' *' : ''), m.label, m.source])));
    ctx.stdout(`\n* headline (KSS in results). KSS 7 or more: sleepy.\n\n${HEALTH_CAUTION}\n`);
    return 0;
  },
};
