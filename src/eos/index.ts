// The property engine's public face: fluids, states, saturation, flashes and reference states.
export { Fluid } from "./fluid.js";
export { getFluid, fluidIds, resolveFluidId, suggestFluids, fluidFromData, foldName, FLUID_DIR } from "./registry.js";
export { flash, flashTP, flashPH, flashPS, flashTS, flashTX, flashPX, flashTRho, INPUT_NAMES, SUPPORTED_PAIRS } from "./flash.js";
export type { Inputs, InputName } from "./flash.js";
export type { State, Phase } from "./state.js";
export { saturationT, saturationP, saturationPressureRange } from "./saturation.js";
export type { Saturation } from "./saturation.js";
export { densityTP } from "./density.js";
export type { Branch } from "./density.js";
export { propertiesTRho, PROP_SLOTS, P, H, S, U, G, CV, CP, W } from "./properties.js";
export { referenceOffset, availableReferences, checkReferenceName, REFERENCE_NAMES, REFERENCE_DESCRIPTIONS } from "./reference.js";
export type { ReferenceName, ReferenceOffset } from "./reference.js";
export { equationCriticalPoint } from "./critical.js";
export type { FluidFile } from "./fluid-file.js";
export { resolveSubstance, substanceId } from "./substance.js";
export type { Substance } from "./substance.js";
export { getMixture, blendIds, Mixture, mixtureFlash, mixtureSaturationT, mixtureSaturationP, MIXTURE_PAIRS, mixtureReferenceOffset, traceEnvelope } from "./mixture/index.js";
export type { EstimatedPair, MixtureInputs, MixtureInputName, MixtureState, PhaseComposition, Envelope, EnvelopePoint } from "./mixture/index.js";
