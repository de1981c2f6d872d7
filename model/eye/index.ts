/** Light at the eye: public entry points of model/eye. */
export { prepareRoom, type PreparedRoom, type PreparedWindow } from './prepared-room.js';
export { evaluateEyeLight, FALLBACK_BEAM_EFFICACY_LM_W } from './eye-light.js';
export { EYE_LIGHT_SOURCES, type EyeLightColumns, type EyeLightSource, type QuantityColumns } from './eye-light-columns.js';
export { PLACE_ELSEWHERE, PLACE_OUTDOORS, PLACE_ROOM, type EyewearSpec, type GroundSpec, type Occupancy, type OutdoorConditions, type RoomScene, type RoomSpec, type RoomWindowSpec } from './scene.js';
export { SceneInputError } from './scene-input-error.js';
export { constantSchedule, type DailySchedule, type ScheduleEntry } from './daily-schedule.js';
export { BLIND_CLOSED, BLIND_LOWERED, BLIND_OPEN, type BlindControl, type BlindStateName, type ShadingSpec } from './blinds.js';
export { coolShareForCct, DEFAULT_EYE_TO_DESK_RATIO, type LuminaireSetting, type LuminaireSpec } from './electric-lighting.js';
export { displaySpectra, screenEyeIlluminance_lx, type ScreenSpec } from './screen.js';
export { type GlazingSpec, type ObstructionSpec, type WallRelativePoint, type WindowSpec } from './window-geometry.js';
export { CIE_SKY_TYPES, SKY_CLEAR, SKY_OVERCAST, SKY_UNIFORM, cieSkyParameters, relativeSkyLuminance } from './cie-general-sky.js';
export { sourceResponse, type SourceResponse } from './source-response.js';
export { outdoorConditionsFromDaylightSeries } from './from-daylight-series.js';
