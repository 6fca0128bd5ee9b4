/**
 * The designer's sweep: the members of several structures, with their target node-to-node lengths, grouped
 * exactly into kit options of K marks each (least largest change of any member, then least sum of squared changes),
 * named by the project's rules. Pure functions over records; the command ({@code cli/SweepCommand}) writes each
 * option as a kit folder and plans it through the whole chain.
 */
package kitwright.sweep;
