/**
 * A communities file that cannot be read at all (wrong encoding, a zip without a .shp, a KML
 * without placemarks). Its message names the file and says what was expected.
 */
export class CommunityFileProblem extends Error {
  override name = 'CommunityFileProblem';
}
