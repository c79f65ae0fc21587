export { readEsriAscii } from './esri-ascii.ts';
export { readGeoTiff } from './geotiff-grid.ts';
export { readTerrainFile, MAX_TERRAIN_BYTES } from './read-terrain-file.ts';
export { terrainBesideStudy, terrainInFolder } from './terrain-path.ts';
