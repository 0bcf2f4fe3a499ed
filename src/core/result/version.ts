/** Version of the program written into every AnalysisResult; keep equal to package.json's version. */
export const PROGRAM_VERSION = '0.1.0';
