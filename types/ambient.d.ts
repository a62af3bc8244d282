declare module 'svg-to-pdfkit' {
  const SVGtoPDF: (doc: unknown, svg: string, x?: number, y?: number, options?: Record<string, unknown>) => void;
  export default SVGtoPDF;
}
declare module 'connect-sqlite3' {
  const factory: (session: unknown) => new (options?: Record<string, unknown>) => import('express-session').Store;
  export default factory;
}
