/**
 * Service-life spares: how many extra bars of each mark a kit needs so that, with a stated probability, every mark
 * still has enough bars after all its assembly cycles.
 *
 * <p>Model (src/docs/sources.md, Reuse and spares): a mark has {@code n} bars in service at once; at each of
 * {@code c} cycles each bar in service is lost with probability {@code p}, and a lost bar is replaced from the spares (the
 * replacement can be lost too), so the mark's losses over the life follow Binomial(n c, p), the last cycle's losses
 * included. The kit's service level {@code L} (all marks covered) is split over the {@code m} marks in service as
 * {@code L^(1/m)} each, which is exact when the marks' losses are independent (common practice). The spares of a mark
 * are the smallest {@code s} with {@code P(losses <= s) >= L^(1/m)}; surplus bars already in the kit count towards
 * them.
 *
 * <p>The functions here are pure (records in, records out). {@link kitwright.spares.ServiceLifeSpares} sizes the
 * spares ({@link kitwright.spares.SparesStage#sizing} for a kit, which both {@code plan} and {@code check} use);
 * cutting them from offcuts before buying stock is done over the cutting stage's API
 * ({@link kitwright.spares.SparesCutting}, {@link kitwright.spares.SparesStage}). The plan of a kit carries the
 * outcome ({@link kitwright.spares.SparesOutcome}: sizing, where the spares came from, extra cost) into plan.json's
 * {@code "spares"} and the report's "Kit figures and service-life spares".
 */
package kitwright.spares;
