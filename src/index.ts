/**
 * The public library API of polewright, by explicit list, stage by stage in pipeline order.
 */
export { InputError, isInputError } from './core/InputError.js';
export { seededRandom, type RandomSource } from './core/seededRandom.js';

export type { Angle, AngleExpr } from './circuit/angle.js';
export { param, evaluateAngle } from './circuit/angle.js';
export type { Block, BlockBody, CallOp, Circuit, GateOp, Modifiers, Op, Register, UnitaryOp } from './circuit/types.js';
export { STANDARD_GATES, standardGate } from './circuit/standardGates.js';
export { gate, call, controlled, inverted, repeated } from './circuit/ops.js';
export { defineBlock, defineConjugatedBlock } from './circuit/defineBlock.js';
export { CircuitBuilder, qubitCount, bitCount } from './circuit/CircuitBuilder.js';
export { gateCounts, blockCounts, totalGates, countsToObject, type GateCounts } from './circuit/gateCounts.js';
export { depthBound } from './circuit/depthBound.js';
export { flatten, flattenBlock, type FlatOp } from './circuit/flatten.js';

export type { ComplexMatrix } from './linalg/ComplexMatrix.js';
export { hermitianEigen } from './linalg/hermitianEigen.js';

export type { FermionModel, TwoBodyTerm, FrequencyGrid } from './model/FermionModel.js';
export { parseModel } from './model/parseModel.js';
export { loadModelFile } from './model/loadModelFile.js';
export { describeModel } from './model/describeModel.js';

export type { LadderSum, LadderTerm, LadderOp } from './operators/LadderSum.js';
export type { PauliSum, PauliTerm } from './operators/PauliSum.js';
export { ladder } from './operators/ladder.js';
export { normalOrder } from './operators/normalOrder.js';
export { adjointFermion } from './operators/adjointFermion.js';
export { commutatorFermion } from './operators/commutatorFermion.js';
export { anticommutatorFermion } from './operators/anticommutatorFermion.js';
export { modelHamiltonian } from './operators/modelHamiltonian.js';
export { jordanWigner } from './operators/jordanWigner.js';
export { simplifyPauli } from './operators/simplifyPauli.js';
export { pauliSumMatrix } from './operators/pauliSumMatrix.js';
export { ladderSumMatrix } from './operators/ladderSumMatrix.js';

export { groundLevel } from './exact/groundLevel.js';
export { greensFunction } from './exact/greensFunction.js';
export { greenMatrixAt } from './exact/greenMatrixAt.js';
export { nonInteractingGreen } from './exact/nonInteractingGreen.js';
export { selfEnergy } from './exact/selfEnergy.js';
export { spectralFunction } from './exact/spectralFunction.js';
export { lehmannForm } from './exact/lehmannForm.js';
export { solveExact } from './exact/solveExact.js';

export type { BlockEncoding, AncillaRegister, AncillaRole, CostNote } from './blocks/BlockEncoding.js';
export { productEncoding } from './blocks/combine/productEncoding.js';
export { linearCombination } from './blocks/combine/linearCombination.js';
export { adjointEncoding } from './blocks/combine/adjointEncoding.js';
export { controlledEncoding } from './blocks/combine/controlledEncoding.js';
export { tensorEncoding } from './blocks/combine/tensorEncoding.js';
export { phasedEncoding } from './blocks/combine/phasedEncoding.js';
export { shiftedEncoding } from './blocks/combine/shiftedEncoding.js';
export { identityEncoding } from './blocks/combine/identityEncoding.js';
export { ladderEncoding } from './blocks/builders/ladderEncoding.js';
export { pauliLcu } from './blocks/builders/pauliLcu.js';
export { modelEncodings } from './blocks/builders/modelEncodings.js';
export { prepareAmplitudes } from './blocks/prepareAmplitudes.js';
export { uniformlyControlledRotation } from './blocks/uniformlyControlledRotation.js';

export { orbitalRotation } from './rotations/orbitalRotation.js';
export { fermionicFourierTransform } from './rotations/fermionicFourierTransform.js';
export { diagonalizeOneBody } from './rotations/diagonalizeOneBody.js';
export { oneBodyRotation } from './rotations/oneBodyRotation.js';
export { slaterDeterminant } from './rotations/slaterDeterminant.js';

export { quantumFourierTransform } from './arithmetic/quantumFourierTransform.js';
export { fourierConstantAdder } from './arithmetic/fourierConstantAdder.js';
export { cuccaroAdder } from './arithmetic/cuccaroAdder.js';
export { rippleConstantAddition } from './arithmetic/rippleConstantAddition.js';

export { singularValueDecomposition } from './linalg/singularValues.js';
export { matrixFunctionOfSingularValues } from './linalg/singularValueTransform.js';

export type { ChebyshevSeries } from './polynomial/ChebyshevSeries.js';
export { evaluateChebyshev } from './polynomial/evaluateChebyshev.js';
export { chebyshevInterpolant } from './polynomial/chebyshevInterpolant.js';
export { measureSupNorm } from './polynomial/measureSupNorm.js';
export { inverseApproximation, type InverseApproximation } from './polynomial/inverseApproximation.js';
export { qspPhases, qspMatrixElement, type QspPhases } from './polynomial/qspPhases.js';

export { fastInverse, type FastInverseEncoding, type FastInverseOptions } from './inversion/fastInverse.js';
export { directShift } from './inversion/directShift.js';
export { greensShifts, type GreensShifts } from './inversion/greensShifts.js';
export { oneBodyOfA } from './inversion/oneBodyOfA.js';

export { qsvtEncoding } from './qsvt/qsvtEncoding.js';
export { qsvtInverse } from './qsvt/qsvtInverse.js';
export { qsvtInverseStructure } from './qsvt/qsvtInverseStructure.js';
export { reflectionPhases } from './qsvt/reflectionPhases.js';

export { resolventEncoding, type ResolventEncoding, type ResolventOptions } from './resolvent/resolventEncoding.js';
export { resolventCost } from './resolvent/resolventCost.js';
export { planResolvent } from './resolvent/planResolvent.js';
export type { ResolventReport, ResolventRoute } from './resolvent/ResolventReport.js';
export { UnreachablePrecisionError } from './resolvent/UnreachablePrecisionError.js';

export type { ResolventFactory } from './readout/ResolventFactory.js';
export type { InitialState, StateAmplitudes } from './readout/InitialState.js';
export { preparedStates } from './readout/preparedStates.js';
export { greenParts, type GreenPart, type GreenPartName } from './readout/greenParts.js';
export { hadamardTestCircuit, type TestComponent } from './readout/hadamardTestCircuit.js';
export { hadamardTests, type HadamardTest } from './readout/hadamardTests.js';
export { encodedExpectation } from './readout/encodedExpectation.js';
export { estimateGreen, type GreenEstimate, type GreenEstimateOptions, type PartEstimate, type TestReading } from './readout/estimateGreen.js';
export { shotsForPrecision, type ShotPlan } from './readout/shotsForPrecision.js';

export { StateVector } from './sim/StateVector.js';
export { simulateState } from './sim/simulateState.js';
export { applyCircuit } from './sim/applyCircuit.js';
export { applyUnitaryOps } from './sim/applyUnitaryOps.js';
export { probabilities } from './sim/probabilities.js';
export { sampleOutcomes } from './sim/sampleOutcomes.js';
export { expectationOfBlock } from './sim/expectationOfBlock.js';
export { circuitMatrix } from './sim/circuitMatrix.js';
export { outcomeDistribution } from './sim/outcomeDistribution.js';
export { registerNativeKernel, type NativeKernel } from './sim/registerNativeKernel.js';
export type { NativeKernelSpec, NativeKernelTable } from './sim/NativeKernelSpec.js';
export { prepareBlockOnZeroAncillas, simulateBlockOnZeroAncillas } from './sim/simulateBlockOnZeroAncillas.js';

export { writeQasm } from './qasm/writeQasm.js';
export { parseQasm } from './qasm/parseQasm.js';
export { QasmParseError, isQasmParseError } from './qasm/QasmParseError.js';

export { verifyEncoding } from './verify/verifyEncoding.js';
export { checkModelBlocks } from './verify/checkModelBlocks.js';
export { cleanRegisterLeak } from './verify/cleanRegisterLeak.js';
export { verifyCircuit } from './verify/verifyCircuit.js';
export { unitaryQasmCircuit } from './verify/unitaryQasmCircuit.js';
export { loadOperatorFile } from './operatorFile/loadOperatorFile.js';
export { parseOperatorFile } from './operatorFile/parseOperatorFile.js';
export { operatorFileJson } from './operatorFile/operatorFileJson.js';
export type { TargetOperator } from './operatorFile/TargetOperator.js';

export { compareRoutes } from './cost/compareRoutes.js';
export { greenCost } from './cost/greenCost.js';
export { structuredBlockCounts, structuredCircuitCounts } from './cost/structuredCounts.js';
export { collectOverrides, defaultOverrideRules } from './cost/collectOverrides.js';
export { resourceTotals } from './cost/resourceTotals.js';
export { tGatesPerRotation } from './cost/rotationSynthesis.js';
