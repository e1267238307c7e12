/** What the attachment and spectrum API returns; shared by the server routes and the client. */

/** A spectrum reduced to what is needed to plot it, with its axes described from the file. */
export interface SpectrumAxis {
  /** Title shown on the axis, e.g. "Wavenumber". */
  title: string;
  /** Unit as written for people, e.g. "cm⁻¹"; empty when the file gives none. */
  unit: string;
  /** The unit as the file spells it (JCAMP-DX ##XUNITS/##YUNITS or a CSV header). */
  raw: string;
}

export interface SpectrumSummary {
  format: 'jcamp-dx' | 'csv' | 'tsv';
  title: string;
  /** JCAMP-DX ##DATA TYPE (e.g. "INFRARED SPECTRUM", "NMR SPECTRUM"), empty for CSV. */
  dataType: string;
  x: SpectrumAxis;
  y: SpectrumAxis;
  /** Chemists read NMR chemical shift and IR wavenumber axes from high to low. */
  reverseX: boolean;
  points: number;
  /** NMR: ##.OBSERVE FREQUENCY in MHz and ##.OBSERVE NUCLEUS, when the file states them. */
  observeFrequencyMHz?: number;
  nucleus?: string;
}

/** A few hundred points keeping each bucket's extremes, enough for a thumbnail. */
export interface SpectrumPreview {
  x: number[];
  y: number[];
}

export interface SpectrumData extends SpectrumSummary {
  data: { x: number[]; y: number[] };
}

export interface AttachmentSummary {
  id: string;
  pageId: string;
  /** The file name as sent, for the record; never used as a storage key or in headers. */
  originalName: string;
  /** The sanitised name shown and used for downloads. */
  displayName: string;
  size: number;
  /** Detected from the content, not taken from the browser's claim. */
  mediaType: string;
  sha256: string;
  uploader: { id: string; name: string };
  createdAt: string;
  /** Added after the page was signed. */
  addendum: boolean;
  /** Present when the file parsed as a spectrum. */
  spectrum: (SpectrumSummary & { preview: SpectrumPreview }) | null;
  /** Why a file that looked like a spectrum could not be read as one; the file is kept. */
  parseError: string | null;
  /** Whether the caller may remove it now. */
  canDelete: boolean;
}
