/**
 * The cutting plan as files people use: the saw sheet ({@code cut-list.csv}), the purchase order
 * ({@code order.csv}), the rack offcuts to take ({@code rack-pull.csv}) and the rack for the next job ({@code rack-after.csv}). Pure formatting: each writer turns
 * records into text; the command line writes the files.
 */
package kitwright.report.cutting;
