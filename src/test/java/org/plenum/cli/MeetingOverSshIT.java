package org.plenum.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.ServerSocket;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

/**
 * A planner joins over a real SSH connection (OpenSSH's sshd on a loopback port, a generated host
 * key, key-only login) and logs a decision the facilitator's screen shows; then the connection
 * drops in the middle of a form and, on return, the form offers the typed input back.
 */
class MeetingOverSshIT {
    private static final String PLANNER = Terminals.PLANNERS.get(1);

    @Test
    void aPlannerOverSshDecidesAndGetsTheirDraftBackAfterTheConnectionDrops() throws Exception {
        // .ci/run installs the OpenSSH server and client and creates the test users; elsewhere this is skipped.
        Assumptions.assumeTrue(Files.isExecutable(Path.of("/usr/sbin/sshd")), "the OpenSSH server is not installed");
        Assumptions.assumeTrue(Terminals.available("ssh") && Terminals.available("ssh-keygen")
                && Terminals.available("tmux"), "ssh, ssh-keygen or tmux is missing");
        Assumptions.assumeTrue("root".equals(System.getProperty("user.name")) && Terminals.userExists(PLANNER),
                "needs root (sshd logs other users in) and the test user " + PLANNER);
        Path dir = Files.createTempDirectory(Path.of("/tmp"), "plenum-ssh-e2e-");
        Processes.run(dir, List.of("chgrp", Terminals.GROUP, dir.toString()), 10);
        Processes.run(dir, List.of("chmod", "2770", dir.toString()), 10);
        Path db = dir.resolve("meeting.db");
        Processes.Result built = Processes.plenum(dir, List.of("demo", "--no-tui", "--db", db.toString(), "--data",
                Processes.root().resolve("demo-data").toString()));
        assertEquals(0, built.code(), built.err());
        Processes.run(dir, List.of("chgrp", Terminals.GROUP, db.toString()), 10);
        Processes.run(dir, List.of("chmod", "660", db.toString()), 10);

        Path keys = Files.createDirectories(dir.resolve("ssh"));
        run(dir, "ssh-keygen", "-q", "-t", "ed25519", "-N", "", "-f", keys.resolve("host").toString());
        run(dir, "ssh-keygen", "-q", "-t", "ed25519", "-N", "", "-f", keys.resolve("planner").toString());
        Files.copy(keys.resolve("planner.pub"), keys.resolve("authorized_keys"));
        Files.setPosixFilePermissions(keys.resolve("authorized_keys"), PosixFilePermissions.fromString("rw-r--r--"));
        int port = freePort();
        Path config = keys.resolve("sshd_config");
        Files.writeString(config, String.join("\n", "ListenAddress 127.0.0.1", "Port " + port,
                "HostKey " + keys.resolve("host"), "AuthorizedKeysFile " + keys.resolve("authorized_keys"),
                "PasswordAuthentication no", "KbdInteractiveAuthentication no", "PubkeyAuthentication yes",
                "UsePAM no", "StrictModes no", "PidFile " + keys.resolve("sshd.pid"), "AllowUsers " + PLANNER,
                "AcceptEnv LANG LC_*", "") );
        Files.createDirectories(Path.of("/run/sshd"));
        Process sshd = new ProcessBuilder("/usr/sbin/sshd", "-D", "-e", "-f", config.toString())
                .redirectErrorStream(true).redirectOutput(keys.resolve("sshd.log").toFile()).start();
        Terminals.Session facilitator = new Terminals.Session(null, "sshfac");
        Terminals.Session planner = new Terminals.Session(null, "sshplanner");
        try {
            facilitator.start(120, 32, "cd " + dir + " && LANG=C.UTF-8 " + java() + " -jar " + Processes.jar()
                    + " meet --db " + db + " --budget 30; sleep 600");
            facilitator.await("[agenda]", 30_000);
            String login = "ssh -t -i " + keys.resolve("planner") + " -p " + port + " -o StrictHostKeyChecking=no"
                    + " -o UserKnownHostsFile=/dev/null -o LogLevel=ERROR " + PLANNER + "@127.0.0.1 "
                    + "'cd " + dir + " && LANG=C.UTF-8 " + java() + " -jar " + Processes.jar() + " meet --db " + db + "'";
            planner.start(120, 32, login + "; sleep 600");
            planner.await("[agenda]", 30_000);
            facilitator.await(PLANNER, 5_000);
            facilitator.type("2");

            planner.type("/KG-0040");
            planner.press("Enter");
            planner.await("filter: KG-0040", 5_000);
            planner.type("a4444");
            planner.press("Tab");
            planner.type("remote planner heard of a new listing");
            planner.press("Enter");
            planner.await("saved: KG-0040", 5_000);
            facilitator.await("remote planner heard of a new listing", 2_000);
            assertTrue(facilitator.screen().contains(PLANNER), facilitator.screen());

            planner.type("1");
            planner.await("[agenda]", 5_000);
            planner.press("Escape");
            // A key typed right after Esc would arrive as Alt+key: wait until the Esc has been read.
            planner.awaitGone("filter: KG-0040", 5_000);
            planner.type("/KG-0050");
            planner.press("Enter");
            planner.await("filter: KG-0050", 5_000);
            planner.type("a-25%");
            planner.press("Tab");
            planner.type("customer cancelled a big order");
            planner.await("customer cancelled a big order", 5_000);
            planner.stop(); // the connection drops: the ssh client dies with its terminal

            Terminals.Session back = new Terminals.Session(null, "sshback");
            try {
                back.start(120, 32, login + "; sleep 600");
                back.await("[agenda]", 30_000);
                back.type("/KG-0050");
                back.press("Enter");
                back.await("filter: KG-0050", 5_000);
                back.type("a");
                String seen = back.await("your unsaved input on KG-0050 is back", 5_000);
                assertTrue(seen.contains("quantity -25%"), seen);
                assertTrue(seen.contains("customer cancelled a big order"), seen);
            } finally {
                back.stop();
            }
        } finally {
            facilitator.stop();
            planner.stop();
            sshd.destroy();
            if (!sshd.waitFor(10, TimeUnit.SECONDS)) {
                sshd.destroyForcibly();
            }
        }
        assertTrue(!sshd.isAlive(), "the SSH server is shut down");
    }

    private static void run(Path dir, String... cmd) throws Exception {
        Processes.Result r = Processes.run(dir, List.of(cmd), 30);
        assertEquals(0, r.code(), r.err());
    }

    private static int freePort() throws Exception {
        try (ServerSocket s = new ServerSocket(0, 1, java.net.InetAddress.getLoopbackAddress())) {
            return s.getLocalPort();
        }
    }

    private static String java() {
        return Path.of(System.getProperty("java.home"), "bin", "java").toString();
    }
}
