package org.qchain.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.awt.image.BufferedImage;
import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.WebSocket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionStage;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.qchain.result.ReportResult;

/**
 * The HTML report in a real browser: headless Chromium (Debian's {@code chromium}, installed by {@code .ci/run})
 * driven through the Chrome DevTools Protocol over the JDK's own WebSocket client. The page must load from the file
 * alone with no console error or exception, every {@code <math>} element must be laid out with a non-zero size,
 * every plot and the diagram must be visible, and the screenshot saved under {@code target/} must hold a fair share
 * of drawn (non-background) pixels, including the plots' curve colour. Skipped with a message when no browser is
 * installed. References: the browser's own MathML and SVG layout (W3C MathML 3, W3C SVG 1.1) and the Chrome DevTools
 * Protocol (Runtime, Log, Page, Emulation domains); the counts and colours below are our own report's design.
 */
class ReportBrowserTest {
    private static final Path DIR = Path.of("target/report-browser").toAbsolutePath();
    private static final int WIDTH = 1200;

    static Optional<Path> browser() {
        for (String name : List.of("chromium", "chromium-browser", "google-chrome", "chrome")) {
            Optional<Path> p = ReportToolsTest.onPath(name);
            if (p.isPresent()) {
                return p;
            }
        }
        Path debian = Path.of("/usr/bin/chromium");
        return Files.isExecutable(debian) ? Optional.of(debian) : Optional.empty();
    }

    /** A DevTools session on one WebSocket: numbered commands, their responses, and every event kept. */
    static final class Session implements WebSocket.Listener {
        private final Map<Integer, CompletableFuture<String>> pending = new ConcurrentHashMap<>();
        final List<String> events = new CopyOnWriteArrayList<>();
        private final StringBuilder part = new StringBuilder();
        private WebSocket ws;
        private int next = 1;

        static Session open(String url) throws Exception {
            Session s = new Session();
            s.ws = HttpClient.newHttpClient().newWebSocketBuilder().buildAsync(URI.create(url), s).get(30,
                TimeUnit.SECONDS);
            return s;
        }

        @Override
        public CompletionStage<?> onText(WebSocket webSocket, CharSequence data, boolean last) {
            part.append(data);
            if (last) {
                String msg = part.toString();
                part.setLength(0);
                Matcher id = Pattern.compile("^\\{\"id\":(\\d+),").matcher(msg);
                if (id.find() && pending.containsKey(Integer.parseInt(id.group(1)))) {
                    pending.remove(Integer.parseInt(id.group(1))).complete(msg);
                } else {
                    events.add(msg);
                }
            }
            webSocket.request(1);
            return null;
        }

        synchronized String send(String method, String params) throws Exception {
            int id = next++;
            CompletableFuture<String> f = new CompletableFuture<>();
            pending.put(id, f);
            ws.sendText("{\"id\":" + id + ",\"method\":\"" + method + "\",\"params\":" + params + "}", true)
                .get(30, TimeUnit.SECONDS);
            String r = f.get(60, TimeUnit.SECONDS);
            if (r.contains("\"error\":{")) {
                throw new AssertionError(method + ": " + r);
            }
            return r;
        }

        /** A string-valued JavaScript expression's value. */
        String evaluate(String expression) throws Exception {
            String r = send("Runtime.evaluate", "{\"expression\":\"" + expression.replace("\\", "\\\\")
                .replace("\"", "\\\"") + "\",\"returnByValue\":true}");
            Matcher m = Pattern.compile("\"value\":\"([^\"]*)\"").matcher(r);
            assertTrue(m.find(), r);
            return m.group(1);
        }

        void close() {
            ws.abort();
        }
    }

    @Test
    void htmlReportRendersInAHeadlessBrowser() throws Exception {
        Optional<Path> browser = browser();
        assumeTrue(browser.isPresent(), "skipped: no browser installed (Debian: apt-get install chromium; .ci/run"
            + " installs it)");
        Files.createDirectories(DIR);
        Path profile = Files.createTempDirectory(DIR, "profile");
        Process p = new ProcessBuilder(browser.get().toString(), "--headless", "--no-sandbox", "--disable-gpu",
            "--disable-dev-shm-usage", "--no-first-run", "--remote-debugging-port=0", "--user-data-dir=" + profile,
            "--window-size=" + WIDTH + ",900", "about:blank").redirectErrorStream(true).start();
        try {
            String ws = devToolsUrl(p);
            Session browserSession = Session.open(ws);
            String created = browserSession.send("Target.createTarget", "{\"url\":\"about:blank\"}");
            Matcher t = Pattern.compile("\"targetId\":\"([^\"]+)\"").matcher(created);
            assertTrue(t.find(), created);
            String base = ws.substring(0, ws.indexOf("/devtools/"));
            // a discrete chain (closed form, sensitivity, P^n plot) and a continuous one (availability, A(t) plot)
            check(base + "/devtools/page/" + t.group(1), "pump-nominal.chain", "report");
            check(base + "/devtools/page/" + t.group(1), "generator-set.chain", "report-continuous");
            browserSession.close();
        } finally {
            p.destroy();
            if (!p.waitFor(10, TimeUnit.SECONDS)) {
                p.destroyForcibly();
            }
            try (var files = Files.walk(profile)) {
                files.sorted(java.util.Comparator.reverseOrder()).forEach(f -> f.toFile().delete());
            }
        }
    }

    /** Loads one model's HTML report in the page and checks it; the screenshot is NAME-screenshot.png. */
    private static void check(String pageUrl, String model, String name) throws Exception {
        ReportResult r = ReportLayoutTest.report(model);
        Path html = DIR.resolve(name + ".html");
        Files.writeString(html, ReportFormat.HTML.layout(12).render(r, name).main(), StandardCharsets.UTF_8);
        {
            Session page = Session.open(pageUrl);
            page.send("Runtime.enable", "{}");
            page.send("Log.enable", "{}");
            page.send("Page.enable", "{}");
            page.send("Emulation.setDeviceMetricsOverride", "{\"width\":" + WIDTH + ",\"height\":900,"
                + "\"deviceScaleFactor\":1,\"mobile\":false}");
            page.send("Page.navigate", "{\"url\":\"" + html.toUri() + "\"}");
            long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
            while (page.events.stream().noneMatch(e -> e.contains("\"method\":\"Page.loadEventFired\""))) {
                assertTrue(System.nanoTime() < deadline, "the page did not load within 60 s");
                Thread.sleep(50);
            }
            String sizes = page.evaluate("(() => { const m = Array.from(document.querySelectorAll('math'));"
                + " const zero = m.filter(e => { const b = e.getBoundingClientRect(); return !(b.width > 0 &&"
                + " b.height > 0); }).length;"
                + " const plots = Array.from(document.querySelectorAll('svg.plot, svg.diagram'));"
                + " const shown = plots.filter(e => { const b = e.getBoundingClientRect(); const s ="
                + " getComputedStyle(e); return b.width > 100 && b.height > 100 && s.visibility !== 'hidden' &&"
                + " s.display !== 'none'; }).length;"
                + " return [m.length, zero, plots.length, shown, document.documentElement.scrollHeight].join(',');"
                + " })()");
            String[] v = sizes.split(",");
            int maths = Integer.parseInt(v[0]);
            assertTrue(maths > 20, "MathML elements: " + maths);
            assertEquals(0, Integer.parseInt(v[1]), "math elements without a size, of " + maths);
            // our own layout: the diagram and two plots of docs/commands.md, "qchain report" (no outside source)
            assertEquals(3, Integer.parseInt(v[2]), "the diagram and two plots");
            assertEquals(3, Integer.parseInt(v[3]), "visible drawings");
            List<String> errors = new ArrayList<>();
            for (String e : page.events) {
                if (e.contains("\"method\":\"Runtime.exceptionThrown\"")
                    || e.contains("\"method\":\"Runtime.consoleAPICalled\"") && e.contains("\"type\":\"error\"")
                    || e.contains("\"method\":\"Log.entryAdded\"") && e.contains("\"level\":\"error\"")) {
                    errors.add(e);
                }
            }
            assertEquals(List.of(), errors, "console errors");
            int height = Math.min(Integer.parseInt(v[4]), 12000);
            String shot = page.send("Page.captureScreenshot", "{\"format\":\"png\",\"captureBeyondViewport\":true,"
                + "\"clip\":{\"x\":0,\"y\":0,\"width\":" + WIDTH + ",\"height\":" + height + ",\"scale\":1}}");
            Matcher d = Pattern.compile("\"data\":\"([^\"]+)\"").matcher(shot);
            assertTrue(d.find());
            Path png = DIR.resolve(name + "-screenshot.png");
            Files.write(png, Base64.getDecoder().decode(d.group(1)));
            BufferedImage img = ImageIO.read(png.toFile());
            assertEquals(WIDTH, img.getWidth());
            long drawn = 0;
            long curve = 0;
            for (int y = 0; y < img.getHeight(); y++) {
                for (int x = 0; x < img.getWidth(); x++) {
                    int rgb = img.getRGB(x, y) & 0xffffff;
                    int red = rgb >> 16;
                    int green = (rgb >> 8) & 0xff;
                    int blue = rgb & 0xff;
                    if (red < 235 || green < 235 || blue < 235) {
                        drawn++;
                    }
                    // #0072b2, SvgPlot's first curve colour: our choice, the blue of Okabe and Ito's colour-blind-safe
                    // palette (Color Universal Design, from memory)
                    if (Math.abs(red - 0x00) < 40 && Math.abs(green - 0x72) < 40 && Math.abs(blue - 0xb2) < 40) {
                        curve++;
                    }
                }
            }
            long total = (long) img.getWidth() * img.getHeight();
            assertTrue(drawn > total / 50, "drawn pixels: " + drawn + " of " + total);
            assertTrue(curve > 500, "pixels in the first curve's colour: " + curve);
            page.close();
        }
    }

    /** Reads the browser's output until it names its DevTools WebSocket. */
    private static String devToolsUrl(Process p) throws Exception {
        CompletableFuture<String> url = new CompletableFuture<>();
        Thread reader = new Thread(() -> {
            try (BufferedReader in = new BufferedReader(new InputStreamReader(p.getInputStream(),
                StandardCharsets.UTF_8))) {
                String line;
                while ((line = in.readLine()) != null) {
                    int k = line.indexOf("ws://");
                    if (line.contains("DevTools listening on") && k >= 0) {
                        url.complete(line.substring(k).trim());
                    }
                }
                url.completeExceptionally(new AssertionError("the browser ended without a DevTools address"));
            } catch (Exception e) {
                url.completeExceptionally(e);
            }
        }, "browser-output");
        reader.setDaemon(true);
        reader.start();
        return url.get(60, TimeUnit.SECONDS);
    }
}
