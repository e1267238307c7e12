/** A file that looked like a spectrum but cannot be read as one; the message is shown to people. */
export class SpectrumParseError extends Error {}
