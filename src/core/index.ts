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

// The return-time engine
export { scanReturns, ScanCancelled } from './returns/scanReturns';
export type { ScanOptions } from './returns/scanReturns';
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
export type { SessionErrorCode } from './session/sessionError';

// Chunked runs and part files (mergeable per-level statistics)
export { chunkPlan, chunkBounds, mergedPositions, scanChunk, scanChunked, mergeScanParts } from './returns/chunkedScan';
export type { ChunkPlan, ScanPart, ChunkHooks } from './returns/chunkedScan';
export { mergeLevelStats, mergeSampledPaths } from './returns/mergeLevels';
export { PART_SCHEMA, PartFileError, partFileJson, readPartFile, checkPartsAgree } from './result/partFile';
export type { PartFacts, PartFileContents } from './result/partFile';
export { analyzeSequenceChunked, analyzeParts, chunkedWarning } from './analyzeChunked';
export { estimatePeakMemory, adviseMemory, memoryAdviceMessage, formatBytes, bytesPerSymbolId, engineBytesPerPosition, DEFAULT_BASE_BYTES } from './returns/memoryEstimate';
export type { MemoryEstimate, MemoryEstimateInput, MemoryAdvice } from './returns/memoryEstimate';
export { scanReturnsSplit, scanGroup, classRuns, assignClasses } from './returns/splitScan';
export type { ScanGroupTask, ScanGroupResult, GroupRunner } from './returns/splitScan';
export { analyzeSequenceSplit } from './analyzeSplit';
