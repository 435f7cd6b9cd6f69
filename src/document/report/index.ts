// The report and pictures of a sketch, shared by the command line and the app.
export { reportDate, reportFileName, reportHtml, sketchPicture, sketchTitle } from './reportHtml';
export type { ReportExchange, ReportInput, ReportSource } from './reportHtml';
export { sketchSvg, type PictureLegend, type PictureShape, type SketchPicture } from './sketchSvg';
export { heatColour, heatColours, HEAT_STOPS, type HeatColours, type HeatQuantity } from './heatColours';
export { NET_HEAT_COLUMNS, type SolvedExchange, type SurfaceColumn } from './exchangeSection';
export { wallProfiles, type WallProfile } from './profiles';
export { PROGRAM_NAME, PROGRAM_VERSION } from './version';
export { REPORT_CAUTION } from './wording';
