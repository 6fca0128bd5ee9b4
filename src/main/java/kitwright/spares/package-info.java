/**
 * Service-life spares: how many extra bars of each mark a kit needs so that, with a stated probability, every mark
 * still has enough bars after all its assembly cycles.
 *
 * <p>Model (src/docs/sources.md): each bar in service is lost or damaged beyond use at most once over the kit's
 * life; with a loss rate {@code p} per bar and cycle and {@code c} cycles a bar is lost with probability
 * {@code q = 1 - (1 - p)^c}, so the losses of a mark of {@code n} bars follow Binomial(n, q). The kit's service level
 * {@code L} (all marks covered) is split over the {@code m} marks as {@code L^(1/m)} each, which is exact when the
 * marks' losses are independent (common practice). The spares of a mark are the smallest {@code s} with
 * {@code P(losses <= s) >= L^(1/m)}.
 *
 * <p>The functions here are pure (records in, records out). {@link kitwright.spares.ServiceLifeSpares} sizes the
 * spares; cutting them from offcuts before buying stock is done over the cutting stage's API
 * ({@link kitwright.spares.SparesCutting}, {@link kitwright.spares.SparesStage}). The plan of a kit carries the
 * outcome ({@link kitwright.spares.SparesOutcome}: sizing, where the spares came from, extra cost) into plan.json's
 * {@code "spares"} and the report's "Kit figures and service-life spares".
 */
package kitwright.spares;
