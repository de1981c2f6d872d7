/**
 * EPW data-line fields the product reads, with their 1-based column, unit and missing-value
 * rule. Layout and missing codes: EnergyPlus Auxiliary Programs, "EnergyPlus Weather File (EPW)
 * Data Dictionary".
 */
export interface EpwFieldSpec {
  /** Key in EpwRecords. */
  readonly key: EpwNumericField;
  /** 1-based column in a comma-split data line. */
  readonly column: number;
  /** Human name for messages. */
  readonly label: string;
  /** True if the value means "missing". */
  readonly isMissing: (v: number) => boolean;
  /** Physically possible range (inclusive); values outside are counted and treated as missing. */
  readonly min: number;
  readonly max: number;
}

export type EpwNumericField =
  | 'dryBulb_C'
  | 'dewPoint_C'
  | 'relativeHumidity_pct'
  | 'pressure_Pa'
  | 'extraterrestrialHorizontal_Wh_m2'
  | 'extraterrestrialNormal_Wh_m2'
  | 'globalHorizontal_Wh_m2'
  | 'directNormal_Wh_m2'
  | 'diffuseHorizontal_Wh_m2'
  | 'globalHorizontal_lx'
  | 'directNormal_lx'
  | 'diffuseHorizontal_lx'
  | 'zenithLuminance_cd_m2'
  | 'totalSkyCover_tenths'
  | 'opaqueSkyCover_tenths'
  | 'precipitableWater_mm'
  | 'snowDepth_cm'
  | 'daysSinceSnowfall'
  | 'albedo';

const atLeast = (code: number) => (v: number) => v >= code;
const equals = (code: number) => (v: number) => v === code;

export const EPW_FIELDS: readonly EpwFieldSpec[] = [
  { key: 'dryBulb_C', column: 7, label: 'dry-bulb temperature', isMissing: atLeast(99.9), min: -90, max: 70 },
  { key: 'dewPoint_C', column: 8, label: 'dew-point temperature', isMissing: atLeast(99.9), min: -90, max: 70 },
  { key: 'relativeHumidity_pct', column: 9, label: 'relative humidity', isMissing: atLeast(999), min: 0, max: 110 },
  { key: 'pressure_Pa', column: 10, label: 'station pressure', isMissing: atLeast(999999), min: 31000, max: 120000 },
  { key: 'extraterrestrialHorizontal_Wh_m2', column: 11, label: 'extraterrestrial horizontal radiation', isMissing: atLeast(9999), min: 0, max: 1500 },
  { key: 'extraterrestrialNormal_Wh_m2', column: 12, label: 'extraterrestrial direct normal radiation', isMissing: atLeast(9999), min: 0, max: 1500 },
  { key: 'globalHorizontal_Wh_m2', column: 14, label: 'global horizontal radiation', isMissing: atLeast(9999), min: 0, max: 1500 },
  { key: 'directNormal_Wh_m2', column: 15, label: 'direct normal radiation', isMissing: atLeast(9999), min: 0, max: 1500 },
  { key: 'diffuseHorizontal_Wh_m2', column: 16, label: 'diffuse horizontal radiation', isMissing: atLeast(9999), min: 0, max: 1000 },
  { key: 'globalHorizontal_lx', column: 17, label: 'global horizontal illuminance', isMissing: atLeast(999900), min: 0, max: 200000 },
  { key: 'directNormal_lx', column: 18, label: 'direct normal illuminance', isMissing: atLeast(999900), min: 0, max: 200000 },
  { key: 'diffuseHorizontal_lx', column: 19, label: 'diffuse horizontal illuminance', isMissing: atLeast(999900), min: 0, max: 150000 },
  { key: 'zenithLuminance_cd_m2', column: 20, label: 'zenith luminance', isMissing: atLeast(9999), min: 0, max: 9998 },
  { key: 'totalSkyCover_tenths', column: 23, label: 'total sky cover', isMissing: equals(99), min: 0, max: 10 },
  { key: 'opaqueSkyCover_tenths', column: 24, label: 'opaque sky cover', isMissing: equals(99), min: 0, max: 10 },
  { key: 'precipitableWater_mm', column: 29, label: 'precipitable water', isMissing: atLeast(999), min: 0, max: 998 },
  { key: 'snowDepth_cm', column: 31, label: 'snow depth', isMissing: atLeast(999), min: 0, max: 998 },
  { key: 'daysSinceSnowfall', column: 32, label: 'days since last snowfall', isMissing: equals(99), min: 0, max: 98 },
  { key: 'albedo', column: 33, label: 'albedo', isMissing: atLeast(999), min: 0, max: 1 },
];

/** Number of comma-separated fields in an EPW data line. */
export const EPW_DATA_FIELD_COUNT = 35;
/** Header lines before the data (LOCATION … DATA PERIODS). */
export const EPW_HEADER_LINES = 8;
