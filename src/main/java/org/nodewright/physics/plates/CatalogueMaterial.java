package org.nodewright.physics.plates;

/**
 * A sheet material of the catalogue.
 *
 * @param id       the word the API uses
 * @param name     shown to the maker
 * @param material the elastic constants, x along the grain (quarter-sawn: y radial)
 * @param source   where the numbers come from, honestly
 */
public record CatalogueMaterial(String id, String name, PlateMaterial material, String source) {
}
