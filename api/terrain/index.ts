export { readTerrainFile } from './read-terrain-file.ts';
export { terrainBesideStudy, terrainInFolder } from './terrain-path.ts';
