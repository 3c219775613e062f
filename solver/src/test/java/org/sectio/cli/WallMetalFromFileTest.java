package org.sectio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code solve --freq} takes the wall metal from the geometry file's {@code "conductor"} unless
 * {@code --conductor} is given. Check: the perturbational wall loss is α_c = Rs ∮|H_tan|² dℓ / (2 · 2P) with
 * Rs = √(ωμ0/(2σ)) (Pozar, Microwave Engineering, 4th ed., §1.7 and §3.3, from memory), so on the same guide,
 * grid and mode α_c(brass)/α_c(copper) = √(σ_Cu/σ_brass) exactly (up to rounding), with σ from Pozar
 * Appendix F (from memory): copper 5.813e7, brass 2.564e7 S/m.
 */
class WallMetalFromFileTest {

    private static final double COPPER = 5.813e7;
    private static final double BRASS = 2.564e7;
    private static final String WR90 = "\"wall\": {\"rectangle\": {\"width\": 22.86, \"height\": 10.16}}";

    @TempDir
    Path folder;

    private Path file(String name, String body) throws IOException {
        Path f = folder.resolve(name);
        Files.writeString(f, "{\"name\": \"Corvel Ridge observatory, test section\", " + body + "}");
        return f;
    }

    private static JsonNode solve(Path file, String... more) throws IOException {
        String[] args = new String[10 + more.length];
        String[] base = {"solve", file.toString(), "--cells", "60", "--family", "te", "-n", "1", "--no-estimate",
            "--format=json"};
        System.arraycopy(base, 0, args, 0, base.length);
        System.arraycopy(more, 0, args, base.length, more.length);
        CapturedRun run = CapturedRun.of(args);
        assertEquals(0, run.exitCode(), run.err());
        return new ObjectMapper().readTree(run.out());
    }

    private static double te10Loss(JsonNode result) {
        return result.get("frequencies").get(0).get("modes").get(0).get("conductor_loss_np_per_m").asDouble();
    }

    @Test
    void brassWallsInTheFileScaleTheWallLossOfCopperByTheSquareRootOfTheConductivityRatio() throws IOException {
        JsonNode brass = solve(file("brass.json", "\"conductor\": \"brass\", " + WR90), "--freq", "10GHz");
        JsonNode plain = solve(file("plain.json", WR90), "--freq", "10GHz");
        assertEquals("brass", brass.get("analysis").get("conductor").asText());
        assertEquals(BRASS, brass.get("analysis").get("conductivity_s_per_m").asDouble(), 0.0);
        assertEquals("copper", plain.get("analysis").get("conductor").asText(), "no key: copper, as before");
        assertEquals(Math.sqrt(COPPER / BRASS), te10Loss(brass) / te10Loss(plain), 1e-9);
    }

    @Test
    void theCommandLineConductorOverridesTheFile() throws IOException {
        Path brassFile = file("brass.json", "\"conductor\": \"brass\", " + WR90);
        JsonNode overridden = solve(brassFile, "--freq", "10GHz", "--conductor", "copper");
        JsonNode plain = solve(file("plain.json", WR90), "--freq", "10GHz");
        assertEquals("copper", overridden.get("analysis").get("conductor").asText());
        assertEquals(te10Loss(plain), te10Loss(overridden), 0.0);
    }

    @Test
    void theReadableTableNamesTheFilesMetalOnTheSkinDepthLine() throws IOException {
        CapturedRun run = CapturedRun.of("solve", file("brass.json", "\"conductor\": \"brass\", " + WR90).toString(),
                "--cells", "60", "--family", "te", "-n", "1", "--no-estimate", "--freq", "10GHz");
        assertEquals(0, run.exitCode(), run.err());
        // δs = √(2/(ωμ0σ)) for brass at 10 GHz = 0.9939 µm (Pozar §1.7; σ App. F, from memory).
        assertTrue(run.out().lines().anyMatch(l -> l.startsWith("walls brass (") && l.contains("skin depth 0.9939 µm")),
                run.out());
    }

    @Test
    void aPinOfAnotherMetalIsTakenAsTheOuterWallsMetalWithANote() throws IOException {
        Path coax = file("coax.json", "\"conductor\": \"copper\", \"inner_conductor_metal\": \"brass\","
                + " \"family\": {\"coaxial\": {\"outer_radius\": 3.5, \"inner_radius\": 1.52}}");
        CapturedRun run = CapturedRun.of("solve", coax.toString(), "--cells", "60", "-n", "1", "--no-estimate",
                "--freq", "1GHz", "--format", "json");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.err().contains("note: inner conductors of brass taken as the outer wall's copper: the wall loss"
                + " uses one metal for every wall\n"), run.err());
        assertEquals("copper", new ObjectMapper().readTree(run.out()).get("analysis").get("conductor").asText());
        CapturedRun given = CapturedRun.of("solve", coax.toString(), "--cells", "60", "-n", "1", "--no-estimate",
                "--freq", "1GHz", "--format", "json", "--conductor", "gold");
        assertFalse(given.err().contains("note:"), "--conductor sets every wall: " + given.err());
    }

    @Test
    void anUnknownMetalInTheFileIsAOneLineErrorAtItsPlace() throws IOException {
        Path bad = file("bad.json", "\"conductor\": \"bronze\", " + WR90);
        CapturedRun run = CapturedRun.of("solve", bad.toString(), "--freq", "10GHz");
        assertEquals(2, run.exitCode());
        assertEquals("sectio: " + bad + ":1:65: $.conductor: unknown conductor \"bronze\"; known: copper, silver, gold,"
                + " aluminium, brass\n", run.err().lines().findFirst().orElse("") + "\n");
    }
}
