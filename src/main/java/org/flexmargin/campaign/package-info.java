/**
 * Clearance campaigns: a case matrix (configurations x flight conditions x failure states x gain
 * factors) with a Monte Carlo layer of uncertain parameters, run sample by sample on local cores
 * (or on Apache Spark, subpackage {@code spark}), with per-sample results streamed to disk and
 * resumed after an interruption, and their statistics: distributions of onset speeds with
 * percentiles, the probability of clearance with its Clopper-Pearson interval, margin bands and
 * the worst samples. Sample {@code s} draws its values from a generator derived from
 * {@code (seed, s)} only, so results do not depend on the engine or the number of workers.
 */
package org.flexmargin.campaign;
