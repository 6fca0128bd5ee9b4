/**
 * A touring kit, leg by leg: kit.json's {@code tour} lists the structures in the order they are built, and each leg
 * (depot to the first venue, venue to venue, the last venue back to the depot) ships what its arriving structure
 * needs, nested, crated and loaded by the kit's own stages. Pure functions only: no files, no console.
 */
package kitwright.tour;
