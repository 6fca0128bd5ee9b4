/**
 * Loading: crates (their outer boxes) onto vehicle decks from the vehicle catalog. Crates may turn 90 degrees;
 * they stand in rows across the deck; only stackable crates carry others, within their top load and the deck
 * height; the payload holds. The vehicle mix is chosen for the least total trip cost and reported beside the
 * fleet-cost lower bound, with the centre of gravity of each load along the deck from the front. The records
 * {@link kitwright.loading.LoadPlan}, {@link kitwright.loading.VehicleLoad} and {@link kitwright.loading.PlacedCrate}
 * are the JSON contract of {@code plan.json -> "loads"}. Load securing (EN 12195-1) and axle loads are not checked.
 */
package kitwright.loading;
