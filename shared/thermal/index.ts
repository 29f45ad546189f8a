/**
 * Frostfold's engine, its public API: the only barrel. Pure TypeScript, SI units inside, no
 * I/O. Every function exported here validates its input and throws ThermalInputError naming
 * the field; iterative solves that stall throw ThermalConvergenceError. Unchecked inner-loop
 * helpers (emissivity evaluation without validation, the chain and tridiagonal solvers, the
 * require* checks) stay internal on purpose.
 */

// Errors and constants
export { ThermalInputError, STEFAN_BOLTZMANN_W_PER_M2_K4 } from "./errors";
export { ThermalConvergenceError } from "./convergence-error";

// Emissivity
export { emissivityAt, isConstantEmissivity, validateEmissivity, type Emissivity } from "./emissivity";

// Gray-body radiation network and geometry
export {
  estimateStack,
  MAX_SHIELDS,
  type StackInput,
  type StackResult,
  type StackResistance,
  type StackShield,
  type StackWall,
} from "./radiation-network";
export { stackNodes, type StackGeometry, type StackNodes } from "./stack-geometry";

// General gray enclosure
export {
  checkViewFactors,
  solveEnclosure,
  MAX_ENCLOSURE_SURFACES,
  type EnclosureInput,
  type EnclosureResult,
  type EnclosureSurface,
} from "./enclosure";
export { solveLinearSystem } from "./linear-solve";

// Residual gas
export {
  defaultAccommodation,
  freeMolecularParameter,
  gasConduction,
  GASES,
  meanFreePath,
  overallAccommodation,
  type GasConductionInput,
  type GasConductionResult,
  type GasData,
  type GasName,
} from "./gas-conduction";

// Real blankets
export {
  blanketCorrelation,
  CORRELATION_SETS,
  polyesterConductivity_W_per_m_K,
  type BlanketCoefficients,
  type BlanketCorrelationInput,
  type BlanketCorrelationResult,
  type CorrelationSet,
  type SolidTemperatureTerm,
} from "./blanket-correlation";
export {
  estimateLayers,
  type BlanketGas,
  type BlanketLayersInput,
  type BlanketLayersResult,
  type SpacerModel,
} from "./blanket-layers";

// Supports and penetrations
export {
  conductivityIntegral,
  EXTRAPOLATION_LIMIT_K,
  SUPPORT_MATERIAL_IDS,
  SUPPORT_MATERIALS,
  supportConduction,
  thermalConductivity,
  type SupportConductionInput,
  type SupportConductionResult,
  type SupportMaterial,
  type SupportMaterialFit,
} from "./supports";

// Cryogens and boil-off
export {
  CRYOGEN_IDS,
  CRYOGENS,
  cryogenProperties,
  SATURATION_PRESSURE_PA,
  saturationTemperatureSlope_K_per_Pa,
  ventedGasFactor,
  type CryogenId,
  type FluidProperties,
} from "./fluids";
export {
  boilOff,
  DEFAULT_VENT_REFERENCE,
  heatFromLiquidVolume,
  heatFromStandardVentFlow,
  heatFromVentedMass,
  MOLAR_GAS_CONSTANT_J_PER_MOL_K,
  VENT_REFERENCE_CONDITIONS,
  type BoilOffInput,
  type BoilOffResult,
  type VentReference,
} from "./boil-off";

// Whole designs: stages, supports, boil-off per sink, band
export {
  MAX_BLOCK_LAYERS,
  MAX_LAYUP_ITEMS,
  MAX_SUPPORTS,
  MAX_TOTAL_SHIELDS,
  type AssemblyCold,
  type AssemblyDesign,
  type AssemblyGeometry,
  type AssemblySpacer,
  type AssemblySupport,
  type AssemblyVacuum,
  type AssemblyWarm,
  type BlockModel,
  type CryogenLoad,
  type LayupBlock,
  type LayupItem,
  type LayupStage,
  type Reflector,
  type ReflectorFaces,
} from "./assembly-design";
export { TORR_PA } from "./assembly-plan";
export {
  estimateAssembly,
  validateAssembly,
  type AssemblyBand,
  type AssemblyBlock,
  type AssemblyLadder,
  type AssemblyResult,
  type AssemblyShield,
  type AssemblyStage,
  type SinkHeat,
} from "./assembly";

// Sweeps
export {
  fewestLayersForTarget,
  MAX_SWEEP_POINTS,
  sweepLayerCount,
  sweepLayerDensity,
  sweepPressure,
  sweepWarmTemperature,
  type SweepPoint,
  type SweepRange,
} from "./sweeps";

// Measured boil-off
export {
  compareWithPrediction,
  fitRate,
  measuredHeatLeak,
  MINIMUM_FIT_POINTS,
  type MeasuredHeatLeakInput,
  type MeasuredHeatLeakResult,
  type MeasurementMethod,
  type RateFit,
} from "./measured-boil-off";
export {
  readSeries,
  suggestSteadyWindow,
  type Series,
  type SteadyWindow,
  type SteadyWindowOptions,
} from "./steady-window";
export { studentTCdf, studentTQuantile } from "./student-t";
