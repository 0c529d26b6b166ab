/**
 * The Apache Spark engine of campaigns: samples are distributed as Spark tasks, each computed by
 * the same {@code SampleRunner} as on local cores, and the driver writes the same result files
 * (plus Parquet). Spark is a provided dependency: only this package refers to it, and it is
 * loaded only when the Spark engine is asked for.
 */
package org.flexmargin.campaign.spark;
