/**
 * Drawing and export core (pure): stencils, cut diagrams (PDF through an injected PdfSink, SVG strings),
 * DXF of the panels, the CSV cut list, and export file names.
 */
export * from './pdf-sink.js';
export * from './paper.js';
export * from './scene.js';
export * from './tiling.js';
export * from './build.js';
export * from './stencil-items.js';
export * from './stencils.js';
export * from './cut-list.js';
export * from './cut-diagram.js';
export * from './dxf.js';
export * from './file-names.js';
export * from './cautions.js';
