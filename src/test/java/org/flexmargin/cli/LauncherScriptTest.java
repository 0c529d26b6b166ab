package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code scripts/flexmargin} in a copy of the source tree's layout, with stand-ins for Maven and
 * Java that record how they were called: it builds the jar when missing or stale, not otherwise,
 * passes every argument through unchanged (spaces included) and returns the program's exit code.
 */
class LauncherScriptTest {
  private record Result(int code, String out, String err) {}

  private static Path executable(Path file, String text) throws IOException {
    Files.createDirectories(file.getParent());
    Files.writeString(file, text);
    file.toFile().setExecutable(true);
    return file;
  }

  private static Result launch(Path script, Path cwd, Map<String, String> env, String... args) throws Exception {
    List<String> cmd = new java.util.ArrayList<>(List.of("bash", script.toString()));
    cmd.addAll(List.of(args));
    ProcessBuilder pb = new ProcessBuilder(cmd).directory(cwd.toFile());
    pb.environment().remove("FLEXMARGIN_JAVA_OPTS");
    pb.environment().putAll(env);
    Process p = pb.start();
    String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
    String err = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
    return new Result(p.waitFor(), out, err);
  }

  @Test
  void buildsWhenNeededAndPassesArgumentsThrough(@TempDir Path tmp) throws Exception {
    assumeTrue(Files.isExecutable(Path.of("/bin/bash")) || Files.isExecutable(Path.of("/usr/bin/bash")), "bash");
    Path root = tmp.resolve("tree");
    Path script = root.resolve("scripts").resolve("flexmargin");
    Files.createDirectories(script.getParent());
    Files.copy(Path.of("scripts", "flexmargin"), script);
    Files.createDirectories(root.resolve("src/main"));
    Files.createDirectories(root.resolve("mode-tables/demo"));
    Files.writeString(root.resolve("pom.xml"), "<project/>");
    Files.setLastModifiedTime(root.resolve("pom.xml"), FileTime.from(Instant.now().minusSeconds(3600)));
    Path log = tmp.resolve("calls.log");
    Path mvn = executable(tmp.resolve("bin/mvn"), "#!/bin/bash\necho \"mvn $*\" >> '" + log + "'\n"
        + "mkdir -p target && echo jar > target/flexmargin.jar\n");
    Path java = executable(tmp.resolve("bin/java"), "#!/bin/bash\nfor a in \"$@\"; do echo \"[$a]\"; done\n"
        + "exit 3\n");
    Map<String, String> env = Map.of("MVN", mvn.toString(), "JAVA", java.toString());
    Path elsewhere = Files.createDirectories(tmp.resolve("somewhere else"));

    Result first = launch(script, elsewhere, env, "demo", "--out", "my report");
    assertEquals(3, first.code(), "the program's exit code: " + first.err());
    assertTrue(first.out().contains("[-jar]\n[" + root.toRealPath().resolve("target/flexmargin.jar") + "]\n[demo]\n"
        + "[--out]\n[my report]\n"), first.out());
    assertTrue(first.err().contains("building"), first.err());
    assertEquals(1, Files.readAllLines(log).size(), "built once");

    Result check = launch(script, elsewhere, env, "check", "x.json");
    assertEquals(1, Files.readAllLines(log).size(), "an up-to-date jar is not rebuilt");
    assertTrue(check.out().startsWith("[-XX:+UseSerialGC]\n[-Xms64m]\n[-XX:TieredStopAtLevel=1]\n[-jar]\n"),
        "a short command runs on the quick JIT compiler: " + check.out());
    Result campaign = launch(script, elsewhere, env, "campaign", "c.json");
    assertTrue(campaign.out().startsWith("[-XX:+UseSerialGC]\n[-Xms64m]\n[-jar]\n"),
        "a campaign gets the optimising compiler: " + campaign.out());
    Map<String, String> own = new java.util.HashMap<>(env);
    own.put("FLEXMARGIN_JAVA_OPTS", "-Xmx1g");
    Result mine = launch(script, elsewhere, own, "demo");
    assertTrue(mine.out().startsWith("[-Xmx1g]\n[-jar]\n"), "the user's options replace the defaults: " + mine.out());

    Path source = root.resolve("src/main/Changed.java");
    Files.writeString(source, "class Changed {}");
    Files.setLastModifiedTime(source, FileTime.from(Instant.now().plusSeconds(60)));
    launch(script, elsewhere, env, "--version");
    assertEquals(2, Files.readAllLines(log).size(), "a jar older than the sources is rebuilt");

    Path failing = executable(tmp.resolve("bin/mvn-fails"), "#!/bin/bash\nexit 1\n");
    Files.delete(root.resolve("target/flexmargin.jar"));
    Result broken = launch(script, elsewhere, Map.of("MVN", failing.toString(), "JAVA", java.toString()), "demo");
    assertEquals(1, broken.code());
    assertTrue(broken.err().contains("the build failed"), broken.err());
    assertEquals("", broken.out(), "the program is not started after a failed build");
  }
}
