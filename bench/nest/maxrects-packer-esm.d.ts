// maxrects-packer 2.7.4 ships "type": "module" with a UMD build as "main", which Node then loads as an
// empty ES module; its ES build lies at dist/maxrects-packer.mjs. Types for that path (no top-level
// import/export here, so this stays a global declaration).
declare module 'maxrects-packer/dist/maxrects-packer.mjs' {
  export * from 'maxrects-packer';
  export { Rectangle } from 'maxrects-packer/dist/geom/Rectangle';
}
