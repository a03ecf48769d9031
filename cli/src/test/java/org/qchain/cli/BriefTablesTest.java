package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** {@code --brief}: the n x n tables are left out, their JSON fields stay (empty) and {@code left_out} names them. */
class BriefTablesTest {
    // Grinstead and Snell, Introduction to Probability, ch. 11: the drunkard's walk on 0..4 with p = 1/2 has
    // t = (3, 4, 3) and B = [[3/4, 1/4], [1/2, 1/2], [1/4, 3/4]] (from memory); its variance 8 from every state
    // (common practice, no source: see ChainEngineTest)
    @Test
    void absorbWithoutTheFundamentalMatrix() {
        Cli.Result r = Cli.run("absorb", Cli.model("drunkard-walk.chain"), "--brief", "--format", "json");
        assertEquals(0, r.code(), r::toString);
        assertEquals("{\"source\":\"" + Cli.model("drunkard-walk.chain") + "\",\"parameters\":[],"
            + "\"transient\":[\"S1\",\"S2\",\"S3\"],\"absorbing\":[\"S0\",\"S4\"],\"made_absorbing\":[],"
            + "\"fundamental\":[],\"expected_steps\":{\"S1\":\"3\",\"S2\":\"4\",\"S3\":\"3\"},"
            + "\"variance\":{\"S1\":\"8\",\"S2\":\"8\",\"S3\":\"8\"},\"absorption\":{\"S1\":{\"S0\":\"3/4\",\"S4\":\"1/4\"},"
            + "\"S2\":{\"S0\":\"1/2\",\"S4\":\"1/2\"},\"S3\":{\"S0\":\"1/4\",\"S4\":\"3/4\"}},\"left_out\":[\"fundamental\"],"
            + "\"warnings\":[]}\n", r.out());
    }

    @Test
    void longrunAndClassesWithoutTheirMatrices() {
        Cli.Result r = Cli.run("longrun", Cli.model("beacon.chain"), "--at", "a=1/3", "--at", "b=1/4", "--brief",
            "--format", "json");
        assertEquals(0, r.code(), r::toString);
        // standard two-state result (from memory): pi = (b/(a + b), a/(a + b)) = (3/7, 4/7)
        assertEquals("{\"source\":\"" + Cli.model("beacon.chain") + "\",\"states\":[\"Lit\",\"Dark\"],"
            + "\"parameters\":[],\"classes\":[{\"states\":[\"Lit\",\"Dark\"],\"closed\":true,\"period\":1,"
            + "\"stationary\":{\"Lit\":\"3/7\",\"Dark\":\"4/7\"},\"mean_recurrence\":{\"Lit\":\"7/3\",\"Dark\":\"7/4\"}}],"
            + "\"absorption_into_classes\":{},\"limit\":[],\"cesaro\":false,\"at\":{\"a\":\"1/3\",\"b\":\"1/4\"},"
            + "\"left_out\":[\"limit\"],\"warnings\":[]}\n",
            r.out());
        Cli.Result c = Cli.run("classes", Cli.model("beacon.chain"), "--at", "a=1/3", "--at", "b=1/4", "--brief");
        assertEquals(0, c.code(), c::toString);
        assertEquals("Structure of " + Cli.model("beacon.chain") + "; parameters at a=1/3, b=1/4 (given with --at)\n"
            + "absorbing: (none)\ntransient: (none)\n"
            + "left out (--brief): the one-step graph\n\nCommunicating classes\n  class  states    kind    period\n"
            + "  0      Lit Dark  closed  1\n\nCaution: results are only as good as the model; safety-critical use"
            + " follows the applicable standards, local codes and licensed engineering review.\n", c.out());
    }
}
