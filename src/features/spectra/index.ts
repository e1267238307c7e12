export { SpectrumEmbed } from './components/SpectrumEmbed';
export { SpectrumThumbnail } from './components/SpectrumThumbnail';
export { SpectrumView } from './components/SpectrumView';
