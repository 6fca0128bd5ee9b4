/**
 * The report people look at: {@code report.html}, one self-contained page (inline CSS and SVG, no script, no
 * font or image from the network) with the summary, the purchase order, the saw sheets, the nested bundles, the
 * crates and trucks, the cautions and the inputs used, printable on A4 (each of these from the saw sheets on
 * starts a new page, under a running header with the kit's name and the date). {@link kitwright.report.PlanFiles}
 * gives every file of a plan folder as text.
 *
 * <p>Colour: one colour per mark throughout the report ({@link kitwright.report.MarkPalette}, in the kit's mark
 * order): the saw sheets, the bundle drawings, the crate lanes and their legends. Every drawing also labels in text
 * and reads in greyscale.
 *
 * <h2>Use</h2>
 * <pre>{@code
 * ReportModel model = ReportModel.of(kit, cutPlan, date);        // or ReportModel.builder(kit, date)...build()
 * String html = HtmlReport.render(model);                         // pure: same model, same string
 * ReportWriter.writeInto(model, outDir);                          // writes outDir/report.html (UTF-8)
 * }</pre>
 *
 * <h2>How the page is made</h2>
 * {@link kitwright.report.ReportModel} holds the sections in reading order; each
 * {@link kitwright.report.ReportSection} names a Mustache template in {@code src/main/resources/kitwright/report/}
 * and a view object (a record of preformatted strings and lists). {@link kitwright.report.HtmlReport} runs each
 * section's template, then the page template {@code report.mustache} (shell, table of contents, stylesheet from
 * {@code report-style.mustache}). Mustache escapes every {@code {{variable}}} for HTML; only SVG built by
 * {@link kitwright.report.Svg} (which escapes text and attribute values itself) goes in raw through
 * {@code {{{triple}}}} braces. Numbers are formatted by {@link kitwright.report.ShopFormat}, never by the locale.
 *
 * <h2>How to add a section (nesting bundles, crates, deck plans, kit options, service-life spares)</h2>
 * <ol>
 *   <li>Write a class {@code XxxSection} in this package with a static {@code of(...)} that takes the stage's
 *       result records and returns a {@link kitwright.report.ReportSection}: an id (e.g. {@code "bundles"}), a
 *       title, the template name and a view record. Keep it a pure function; format numbers with
 *       {@code ShopFormat}; draw with {@code Svg} (ids inside an SVG must be unique in the page: prefix them with
 *       the drawing's id, and give every drawing a {@code data-...} attribute the browser test can count).</li>
 *   <li>Add {@code src/main/resources/kitwright/report/xxx.mustache} using {@code {{name}}} for text and
 *       {@code {{{svg}}}} only for SVG strings built with {@code Svg}. Add its CSS to
 *       {@code report-style.mustache} (prefix the classes with the section's name; print rules go in the
 *       {@code @media print} block, e.g. {@code break-before: page}).</li>
 *   <li>Either hand the section to {@link kitwright.report.ReportModel.Builder#section} from the command that ran
 *       the stage, or give the builder a typed method (like {@code cutting(CutPlan)}) that stores the result and
 *       adds the section in {@code build()} when the result is present; an absent stage adds nothing. Stage
 *       cautions go in through {@link kitwright.report.ReportModel.Builder#caution}.</li>
 *   <li>Test it like the saw sheets: text escaping with a hostile mark name, byte-identical output twice, and a
 *       DOM check in the browser test that every item has its drawing.</li>
 * </ol>
 */
package kitwright.report;
