package org.flexmargin.campaign.spark;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaRDD;
import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.RowFactory;
import org.apache.spark.sql.SaveMode;
import org.apache.spark.sql.SparkSession;
import org.apache.spark.sql.types.DataTypes;
import org.apache.spark.sql.types.StructField;
import org.apache.spark.sql.types.StructType;
import org.flexmargin.campaign.CampaignPlan;
import org.flexmargin.campaign.CampaignStore;
import org.flexmargin.campaign.Cell;
import org.flexmargin.campaign.SampleCsv;
import org.flexmargin.campaign.SampleOutcome;
import org.flexmargin.io.CampaignReader;

/**
 * Runs the samples of a campaign that are not done yet as Spark tasks. Each executor reads the
 * campaign file (and its base case) from the same path as the driver, so on a cluster the files
 * must be on a file system every executor sees at that path. Each task returns the sample's
 * result lines in the format of {@link SampleCsv}; the driver appends them to the store as
 * partitions finish (so an interrupted run resumes), then writes {@code samples.parquet} beside
 * the CSV files. Without a master set by {@code spark-submit}, runs in local mode on all cores.
 */
public final class SparkEngine {
  /** Tasks per core in one batch (one Spark job). */
  static final int BATCH_TASKS_PER_CORE = 8;

  private SparkEngine() {}

  /**
   * @param campaignFile the campaign file (absolute path, readable by every executor)
   * @param plan the campaign
   * @param store done samples and where new ones go
   * @return every outcome, task order
   */
  public static List<SampleOutcome> run(Path campaignFile, CampaignPlan plan, CampaignStore store) {
    SparkConf conf = new SparkConf().setAppName("flexmargin campaign " + plan.spec().name());
    if (!conf.contains("spark.master")) {
      conf.setMaster("local[*]");
    }
    if (conf.get("spark.master").startsWith("local")) {
      // local mode: loopback interface whatever the host name resolves to, no web UI, no shuffle fan-out
      for (String[] kv : new String[][] {{"spark.driver.host", "127.0.0.1"}, {"spark.driver.bindAddress", "127.0.0.1"},
          {"spark.ui.enabled", "false"}, {"spark.sql.shuffle.partitions", "1"}}) {
        if (!conf.contains(kv[0])) {
          conf.set(kv[0], kv[1]);
        }
      }
    }
    SparkSession spark = SparkSession.builder().config(conf).getOrCreate();
    try {
      return run(spark, campaignFile, plan, store);
    } finally {
      spark.stop();
    }
  }

  private static List<SampleOutcome> run(SparkSession spark, Path campaignFile, CampaignPlan plan,
      CampaignStore store) {
    JavaSparkContext jsc = JavaSparkContext.fromSparkContext(spark.sparkContext());
    Map<Integer, SampleOutcome> done = store.done();
    List<Integer> todo = new ArrayList<>();
    for (int t = 0; t < plan.taskCount(); t++) {
      if (!done.containsKey(t)) {
        todo.add(t);
      }
    }
    SampleCsv csv = new SampleCsv(plan);
    if (!todo.isEmpty()) {
      String path = campaignFile.toString();
      // batches of a few tasks per core: each batch is one Spark job whose results are appended to
      // the store as soon as it ends (so an interrupted run loses at most one batch)
      int batch = Math.max(1, jsc.defaultParallelism() * BATCH_TASKS_PER_CORE);
      for (int from = 0; from < todo.size(); from += batch) {
        List<Integer> part = todo.subList(from, Math.min(todo.size(), from + batch));
        JavaRDD<String> results = jsc.parallelize(part, Math.min(part.size(), jsc.defaultParallelism()))
            .map(t -> Worker.run(path, t));
        for (String text : results.collect()) {
          SampleOutcome o = parse(csv, text);
          store.append(o);
          done.put(o.task(), o);
        }
      }
    }
    List<SampleOutcome> all = new ArrayList<>(done.values());
    writeParquet(spark, plan, csv, all, store);
    return all;
  }

  /** @return the outcome of a task's result text: the sample line, then its margin lines */
  static SampleOutcome parse(SampleCsv csv, String text) {
    String[] lines = text.split("\n");
    List<String> margins = new ArrayList<>();
    for (int i = 1; i < lines.length; i++) {
      margins.add(lines[i]);
    }
    return csv.parse(lines[0], margins);
  }

  private static void writeParquet(SparkSession spark, CampaignPlan plan, SampleCsv csv, List<SampleOutcome> all,
      CampaignStore store) {
    List<StructField> fields = new ArrayList<>(List.of(
        DataTypes.createStructField("task", DataTypes.IntegerType, false),
        DataTypes.createStructField("cell", DataTypes.IntegerType, false),
        DataTypes.createStructField("sample", DataTypes.IntegerType, false),
        DataTypes.createStructField("configuration", DataTypes.StringType, false),
        DataTypes.createStructField("flight_condition", DataTypes.StringType, false),
        DataTypes.createStructField("failure_state", DataTypes.StringType, false),
        DataTypes.createStructField("gain_factor", DataTypes.DoubleType, false),
        DataTypes.createStructField("status", DataTypes.StringType, false),
        DataTypes.createStructField("divergence_eas_mps", DataTypes.DoubleType, true),
        DataTypes.createStructField("open_loop_flutter_eas_mps", DataTypes.DoubleType, true),
        DataTypes.createStructField("closed_loop_onset_eas_mps", DataTypes.DoubleType, true),
        DataTypes.createStructField("margin_onset_eas_mps", DataTypes.DoubleType, true),
        DataTypes.createStructField("critical_eas_mps", DataTypes.DoubleType, true),
        DataTypes.createStructField("draws", DataTypes.createArrayType(DataTypes.DoubleType, false), false),
        DataTypes.createStructField("governing", DataTypes.StringType, false)));
    List<Row> rows = new ArrayList<>();
    for (SampleOutcome o : all) {
      Cell c = plan.cells().get(o.cell());
      double[] d = o.draws();
      Double[] boxed = new Double[d.length];
      for (int i = 0; i < d.length; i++) {
        boxed[i] = d[i];
      }
      rows.add(RowFactory.create(o.task(), o.cell(), o.sample(), c.configuration(), c.condition().name(),
          c.failure().name(), c.gainFactor(), o.status().name(), nullable(o.divergenceEasMps()),
          nullable(o.openLoopFlutterEasMps()), nullable(o.closedLoopOnsetEasMps()), nullable(o.marginOnsetEasMps()),
          nullable(o.criticalEasMps()), boxed, o.governing()));
    }
    Dataset<Row> df = spark.createDataFrame(rows, new StructType(fields.toArray(new StructField[0])));
    df.coalesce(1).write().mode(SaveMode.Overwrite).parquet(store.folder().resolve("samples.parquet").toString());
  }

  private static Double nullable(double v) {
    return Double.isNaN(v) ? null : v;
  }

  /** The per-executor side: one runner per campaign file and JVM. */
  static final class Worker {
    private static String loadedPath;
    private static org.flexmargin.campaign.SampleRunner runner;

    private Worker() {}

    /** @return the task's sample line and margin lines, newline-separated */
    static String run(String campaignPath, int task) {
      org.flexmargin.campaign.SampleRunner r = runner(campaignPath);
      SampleOutcome o = r.run(task);
      StringBuilder sb = new StringBuilder(new SampleCsv(r.plan()).sampleLine(o));
      for (String m : SampleCsv.marginLines(o)) {
        sb.append('\n').append(m);
      }
      return sb.toString();
    }

    private static synchronized org.flexmargin.campaign.SampleRunner runner(String campaignPath) {
      if (!campaignPath.equals(loadedPath)) {
        Path file = Path.of(campaignPath);
        CampaignPlan plan = new CampaignPlan(CampaignReader.read(file));
        Path base = file.getParent().resolve(plan.spec().baseCaseFile()).normalize();
        try {
          Path scratch = Files.createTempDirectory("flexmargin-campaign-");
          scratch.toFile().deleteOnExit();
          runner = new org.flexmargin.campaign.SampleRunner(plan, base, scratch);
        } catch (IOException e) {
          throw new UncheckedIOException("cannot create a scratch folder for campaign samples", e);
        }
        loadedPath = campaignPath;
      }
      return runner;
    }
  }
}
