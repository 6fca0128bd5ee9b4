/**
 * Input values of a kit: bars (marks), structures, joints, the tube catalog with its sections and stock lengths,
 * materials, crate and vehicle catalogs, and the settings from {@code kit.json}. All lengths in millimetres,
 * masses in kilograms, prices in the catalog's currency.
 */
package kitwright.model;
