// The heat colour scale, one for the canvas and the exported pictures and report (src/document/report).
export { HEAT_STOPS, heatColour } from '../../document/report/heatColours';
