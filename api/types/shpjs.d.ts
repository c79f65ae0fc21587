// shpjs ships no type declarations; this covers the one call Tremora makes (api/study/community-files/shapefile-table.ts).
declare module 'shpjs' {
  interface ShapefileParts {
    shp: Uint8Array;
    dbf?: Uint8Array;
    prj?: string;
    cpg?: Uint8Array;
  }
  export default function getShapefile(
    input: ShapefileParts,
  ): Promise<import('geojson').FeatureCollection>;
}
