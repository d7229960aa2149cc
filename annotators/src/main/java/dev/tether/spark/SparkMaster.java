package dev.tether.spark;

import java.io.IOException;
import java.net.InetSocketAddress;
import java.net.Socket;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The value of {@code --spark}: where the job runs. Checked before any work starts, without Spark's classes.
 *
 * <ul>
 *   <li>{@code local}, {@code local[N]}, {@code local[*]}: embedded in this process with N task slots. A failed task
 *       is tried again up to {@value #LOCAL_TASK_TRIES} times in all, as on a cluster ({@code spark.task.maxFailures}'s
 *       default), where plain Spark's local mode would fail the job at once; {@code local[N,F]} sets the tries.</li>
 *   <li>{@code spark://host:port[,host:port...]}: a standalone cluster; every master address must accept a
 *       connection within {@value #CONNECT_MILLIS} ms, or the run stops before any work with the address named.</li>
 *   <li>{@code yarn}, {@code k8s://...}: handed to Spark as given (normally through {@code spark-submit}).</li>
 * </ul>
 */
public record SparkMaster(String given, String url, boolean local) {
    /** Tries of a task in the embedded mode (Spark's default {@code spark.task.maxFailures} on a cluster). */
    public static final int LOCAL_TASK_TRIES = 4;
    static final int CONNECT_MILLIS = 5_000;

    private static final Pattern LOCAL = Pattern.compile("local(?:\\[(\\*|[1-9][0-9]*)(?:,([1-9][0-9]*))?])?");
    private static final Pattern STANDALONE = Pattern.compile("spark://(.+)");

    /** The master named by {@code value}; an unknown form fails with the forms accepted. */
    public static SparkMaster parse(String value) {
        Matcher m = LOCAL.matcher(value);
        if (m.matches()) {
            String slots = m.group(1) == null ? "1" : m.group(1);
            String tries = m.group(2) == null ? String.valueOf(LOCAL_TASK_TRIES) : m.group(2);
            return new SparkMaster(value, "local[" + slots + "," + tries + "]", true);
        }
        if (STANDALONE.matcher(value).matches()) {
            addresses(value); // fails on a malformed address
            return new SparkMaster(value, value, false);
        }
        if (value.equals("yarn") || value.startsWith("k8s://")) return new SparkMaster(value, value, false);
        throw new IllegalArgumentException("'" + value + "' is not a Spark master; give local[N] (embedded, N task slots),"
                + " spark://host:port (a standalone cluster), yarn or k8s://...");
    }

    /**
     * Fails, naming the address, when a standalone master does not accept a connection; other masters are left to
     * Spark (the job's first task then has a deadline, see {@link SparkJob#checkExecutors}).
     */
    public void checkReachable() throws IOException {
        if (local || !url.startsWith("spark://")) return;
        List<String> unreachable = new ArrayList<>();
        for (InetSocketAddress address : addresses(url)) {
            try (Socket s = new Socket()) {
                s.connect(new InetSocketAddress(address.getHostString(), address.getPort()), CONNECT_MILLIS);
            } catch (IOException e) {
                String why = e instanceof java.net.UnknownHostException ? "unknown host" : e.getMessage();
                unreachable.add(address.getHostString() + ":" + address.getPort() + " (" + why + ")");
            }
        }
        if (!unreachable.isEmpty()) {
            throw new IOException("the Spark master " + url + " cannot be reached: " + String.join(", ", unreachable)
                    + "; check the address and that the master is running (its web page shows the spark:// URL)");
        }
    }

    private static List<InetSocketAddress> addresses(String url) {
        List<InetSocketAddress> all = new ArrayList<>();
        for (String hostPort : url.substring("spark://".length()).split(",")) {
            int colon = hostPort.lastIndexOf(':');
            int port = -1;
            if (colon > 0) {
                try {
                    port = Integer.parseInt(hostPort.substring(colon + 1));
                } catch (NumberFormatException e) {
                    port = -1;
                }
            }
            if (port <= 0 || port > 65535) {
                throw new IllegalArgumentException("'" + url + "': '" + hostPort + "' is not host:port; a standalone"
                        + " master is spark://host:port (port 7077 unless the cluster set another)");
            }
            all.add(InetSocketAddress.createUnresolved(hostPort.substring(0, colon), port));
        }
        return all;
    }
}
