// The public surface of the numeric core, for hosts (command line, workers, workbench) only. Code
// inside src/core imports concrete files, never this barrel.

// Sequences and readers
export type { SymbolArray, Sequence } from './sequence/sequence';
export { allocateSymbols } from './sequence/sequence';
export { ReadError } from './sequence/readError';
export type { ReadErrorCode, InputPosition } from './sequence/readError';
export { createReader, readAll } from './sequence/sequenceReader';
export { createDigestingReader } from './sequence/digestingReader';
export type { DigestingReader } from './sequence/digestingReader';
export type { InputFormat, ReaderOptions, ReadResult, SequenceReader, FastaRecord, ReadWarning } from './sequence/sequenceReader';
export { guessFormat, SNIFF_BYTES } from './sequence/guessFormat';
export { recordSequences } from './sequence/recordSequences';
export { previewHead, PREVIEW_BYTES, PREVIEW_LINES, PREVIEW_LINE_CHARS, PREVIEW_SYMBOLS_LISTED } from './sequence/previewHead';
export type { HeadPreview, PreviewIssue, PreviewOptions } from './sequence/previewHead';

// Real-valued series turned into symbols
export { parseSymbolizeSpec, formatSymbolizeSpec, SYMBOLIZE_SPEC_FORMS } from './symbolize/symbolizeSpec';
export type { SymbolizeSpec } from './symbolize/symbolizeSpec';
export { MISSING_POLICIES } from './symbolize/missingPolicy';
export type { MissingPolicy } from './symbolize/missingPolicy';
export type { SymbolizationRecord } from './symbolize/symbolizationRecord';
export { createNumericReader, readNumericSeries } from './symbolize/numericSeriesReader';
export type { NumericSeriesReader } from './symbolize/numericSeriesReader';
export type { NumericSeries } from './symbolize/seriesCollector';
export { symbolizeSeries } from './symbolize/symbolizeSeries';
export type { SymbolizedSeries } from './symbolize/symbolizeSeries';
export { symbolizationSummary } from './symbolize/symbolizationSummary';
export { longestSegment } from './symbolize/longestSegment';
export type { SymbolizationSummary, SummaryOptions } from './symbolize/symbolizationSummary';
export { valueHistogram } from './symbolize/valueHistogram';
export type { ValueHistogram } from './symbolize/valueHistogram';
export { downsampleMinMax } from './symbolize/downsampleMinMax';
export type { DownsampledSeries } from './symbolize/downsampleMinMax';

// The return-time engine
export { reserveScanWorkspace, scanReturns, ScanCancelled } from './returns/scanReturns';
export type { ScanOptions, ShareProgress } from './returns/scanReturns';
export type { LevelStats, ReturnScan, SampledPaths } from './returns/levelStats';
export { HISTOGRAM_BINS_PER_NAT } from './returns/levelStats';

// The analysis and its result
export { analyzeSequence, analyzeFromScan, validateSettings } from './analyze';
export type { AnalysisHooks, ReferenceFacts, AnalysisMethodOptions } from './analyze';
export { ANALYSIS_SCHEMA, ANALYSIS_SET_SCHEMA, DEFAULT_SETTINGS } from './result/analysisResult';
export type {
  AnalysisResult,
  AnalysisSettings,
  AnalysisWarning,
  AlternativeEstimate,
  EntropyEstimate,
  EntropyUnit,
  ExponentialLawSummary,
  InputSummary,
  Interval,
  LengthRow,
  SampledPathsSummary,
  Sigma2Estimate,
} from './result/analysisResult';
export { PROGRAM_VERSION } from './result/version';
export { alphabetSummary, ALPHABET_LISTED } from './result/alphabetSummary';
export type { SymbolCount } from './result/alphabetSummary';
export { lengthsCsv } from './result/lengthsCsv';
export { lengthRowOfLevel } from './estimate/lengthRowOfLevel';
export { capturedReturnsCsv } from './result/returnsCsv';
export { entropyFromNats, varianceFromNats, rateUnitLabel, varianceUnitLabel } from './estimate/units';
export { EULER_GAMMA, LOG_EXPONENTIAL_VARIANCE } from './estimate/exponentialLaw';

// Fluctuations against N(0,1) and the return law against Exp(1)
export { normalizedFluctuations } from './estimate/normalizedFluctuations';
export type { NormalizedFluctuations } from './estimate/normalizedFluctuations';
export { kolmogorovSmirnovPValue, kolmogorovLimitSurvival } from './estimate/kolmogorovSmirnovPValue';
export type { KolmogorovPValue, KolmogorovMethod } from './estimate/kolmogorovSmirnovPValue';
export { andersonDarlingPValue, andersonDarlingLimitCdf } from './estimate/andersonDarlingPValue';
export { kolmogorovSmirnovNormal } from './estimate/kolmogorovSmirnovNormal';
export type { KolmogorovSmirnovResult } from './estimate/kolmogorovSmirnovNormal';
export { andersonDarlingNormal } from './estimate/andersonDarlingNormal';
export type { AndersonDarlingResult } from './estimate/andersonDarlingNormal';
export { normalFitTests, DEPENDENCE_CAVEAT } from './estimate/normalFitTests';
export type { NormalFitTests } from './estimate/normalFitTests';
export { normalQuantilePlot } from './estimate/normalQuantilePlot';
export type { NormalQuantilePlot, NormalQuantilePlotOptions } from './estimate/normalQuantilePlot';
export { normalHistogram } from './estimate/normalHistogram';
export type { NormalHistogram, NormalHistogramOptions, BinRule } from './estimate/normalHistogram';
export { kaplanMeier, kaplanMeierAt, kaplanMeierIndex, kaplanMeierMean } from './estimate/kaplanMeier';
export type { KaplanMeierCurve, RestrictedMean } from './estimate/kaplanMeier';
export { returnLaw, RETURN_LAW_CAVEAT } from './estimate/returnLaw';
export type { ReturnLaw, ReturnLawOptions } from './estimate/returnLaw';

// Reference sources
export type { ReferenceSource, SourceFacts, DetailedSample } from './sources/referenceSource';
export { sourceCatalog, parseSourceSpec, SOURCE_SPEC_FORMS } from './sources/catalog';
export { iidSource } from './sources/iidSource';
export { fairCoinSource } from './sources/fairCoinSource';
export { markovSource } from './sources/markovSource';
export { parrySource, goldenMeanSource } from './sources/parrySource';
export { continuedFractionSource } from './sources/continuedFractionSource';
export { renewalSource } from './sources/renewalSource';
export { markovEntropyRate, markovVarentropyRate, stationaryDistribution } from './sources/markovEntropy';

// Sessions: a saved analysis with the settings and view it was shown with
export { SESSION_SCHEMA, sessionOf } from './session/session';
export type { JsonObject, JsonValue, Session, SessionParts } from './session/session';
export { writeSession } from './session/writeSession';
export { readSession, looksLikeSession } from './session/readSession';
export { SessionError } from './session/sessionError';
export { calibrationBelongsTo, calibrationMismatch } from './session/calibrationBelongsTo';
export type { CalibrationTie } from './session/calibrationBelongsTo';
export type { SessionErrorCode } from './session/sessionError';

// Calibration at the data's own length: Markov surrogates of the order BIC picks
export { markovOrderFit, orderCap, MIN_MEAN_PER_CELL, MAX_FITTED_ORDER } from './calibration/markovOrderFit';
export type { MarkovOrderFit, OrderScore } from './calibration/markovOrderFit';
export { fittedMarkovModel, markovModelOfRows, generateFromModel } from './calibration/fittedMarkovModel';
export type { FittedMarkovModel } from './calibration/fittedMarkovModel';
export { surrogateStudy, runReplicate, replicateSeed, MAX_REPLICATES } from './calibration/surrogateStudy';
export type { ReplicateRecord, StudyHooks } from './calibration/surrogateStudy';
export { calibrationSummary } from './calibration/calibrationSummary';
export type { CalibrationSummary, EstimatorCalibration, CorrectedEstimate, UserEstimate } from './calibration/calibrationSummary';
export {
  CALIBRATION_SCHEMA,
  MIN_CALIBRATION_REPLICATES,
  calibrateSequence,
  calibrationModelFacts,
  calibrationResult,
  checkReplicates,
  fitCalibrationModel,
} from './calibration/calibrationResult';
export type { CalibratedAnalysis, CalibrationModel, CalibrationModelFacts, CalibrationResult } from './calibration/calibrationResult';
// Mixing diagnostics and information moments
export { mixingDiagnostics } from './diagnostics/mixingDiagnostics';
export type { DiagnosticsSummary, DiagnosticsOptions } from './diagnostics/mixingDiagnostics';
export type { DecayFit } from './diagnostics/decayFits';
export type { MixingReading, MixingVerdict } from './diagnostics/mixingReading';
export type { InformationMoments } from './diagnostics/informationMoments';
// Two sequences: cross and relative entropy rates from waiting times
export { compareSequences, pairCount, MIN_PAIR_LENGTH } from './cross/compareSequences';
export type { ComparisonHooks, ComparisonInputFacts, CrossReferenceFacts } from './cross/compareSequences';
export { COMPARISON_SCHEMA } from './cross/comparisonResult';
export type { ComparisonResult, ComparisonRow, ComparisonInput, ComparisonExact, ComparisonFluctuations, RateEstimate } from './cross/comparisonResult';
export { crossReferenceOfSpecs, transitionRowsOfSpec } from './cross/crossReferenceOfSpecs';
export { markovCrossFacts } from './sources/markovCrossEntropy';
export type { MarkovCrossFacts } from './sources/markovCrossEntropy';
// Chunked runs and part files (mergeable per-level statistics)
export { chunkPlan, chunkBounds, mergedPositions, scanChunk, scanChunked, scanChunkedOn, mergeScanParts } from './returns/chunkedScan';
export type { ChunkPlan, ScanPart, ChunkHooks } from './returns/chunkedScan';
export { mergeLevelStats, mergeSampledPaths } from './returns/mergeLevels';
export { PART_SCHEMA, PartFileError, partFileJson, readPartFile, checkPartsAgree } from './result/partFile';
export type { PartFacts, PartFileContents } from './result/partFile';
export { analyzeSequenceChunked, analyzeSequenceChunkedOn, analyzeParts, chunkedWarning } from './analyzeChunked';
export { estimatePeakMemory, adviseMemory, memoryAdviceMessage, formatBytes, bytesPerSymbolId, engineBytesPerPosition, DEFAULT_BASE_BYTES } from './returns/memoryEstimate';
export { pageMemoryCheck, PAGE_MEMORY_BUDGET_BYTES } from './returns/pageMemoryCheck';
export type { MemoryEstimate, MemoryEstimateInput, MemoryAdvice } from './returns/memoryEstimate';
export { scanReturnsSplit, scanGroup, classRuns, assignClasses, SHARE_FROM_SYMBOLS } from './returns/splitScan';
export type { ScanGroupTask, ScanGroupResult } from './returns/splitScan';
export { runScanJob, inThisThread, jobTransfers, resultTransfers } from './returns/scanJobs';
export type { ScanJob, ScanJobResult, ScanRunner } from './returns/scanJobs';
export { jobPool, answerJob } from './returns/jobPool';
export { isShared, sharedSymbols } from './returns/sharedBuffer';
export type { JobPort, JobPool, JobRequest, JobReply } from './returns/jobPool';
export { analyzeSequenceSplit } from './analyzeSplit';
