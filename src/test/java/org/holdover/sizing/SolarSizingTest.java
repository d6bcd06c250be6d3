package org.holdover.sizing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.holdover.project.InputException;
import org.holdover.project.ProjectReader;
import org.holdover.solar.HourCalendar;
import org.holdover.solar.WeatherYear;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The solar section through the sizing: optional, the tilt, and the weather-file paths. */
class SolarSizingTest {

    @Test
    void withoutASolarSectionTheSizingIsAsBefore() {
        // The sizing rules alone (the system search weighs the PV's cost too, so it may choose another bank).
        SizingResult withPv = Sizing.rules(Demos.input(Demos.FARM), null);
        SizingInput in = Demos.withSolar(withPv.input(), null);
        SizingResult r = Sizing.rules(in, null);
        assertThat(r.solar()).isNull();
        assertThat(r.checks()).noneMatch(c -> c.id().startsWith("pv."));
        assertThat(r.advisories()).noneMatch(c -> c.id().startsWith("pv."));
        // The PV step comes after the bank is chosen and changes nothing before it.
        assertThat(r.bank().module().id()).isEqualTo(withPv.bank().module().id());
        assertThat(r.bank().strings()).isEqualTo(withPv.bank().strings());
        assertThat(r.inverter().spec().id()).isEqualTo(withPv.inverter().spec().id());
        List<Check> before = withPv.checks().stream().filter(c -> !c.id().startsWith("pv")).toList();
        assertThat(r.checks()).isEqualTo(before);
    }

    /**
     * The worst month is in winter, so the tilt that favours it is steeper than the latitude (winter-optimal tilt about
     * latitude + 10 to 15°: common practice, from memory); and no tilt tried needs a smaller array.
     */
    @Test
    void theTiltFavoursTheWorstMonth() {
        SizingResult r = Demos.cabin();
        PvOption o = r.solar().chosen();
        assertThat(r.solar().setup().fixedTiltDeg()).isNull();
        int worst = o.sizing().worstMonth();
        assertThat(worst == 0 || worst == 1 || worst >= 9).as("worst month %d is in winter", worst + 1).isTrue();
        assertThat(o.tiltDeg()).isGreaterThan(r.solar().setup().site().latitudeDeg());
        double chosen = o.requiredByTiltW()[indexOf(o.tiltsDeg(), o.tiltDeg())];
        for (double w : o.requiredByTiltW()) {
            assertThat(w).isGreaterThanOrEqualTo(chosen);
        }
        // Both neighbours 1° away were tried and need more.
        assertThat(o.tiltsDeg()).contains(o.tiltDeg() - 1, o.tiltDeg() + 1);
    }

    /** A weather file written from the demo's synthetic year at full precision sizes the same array. */
    @Test
    void aWeatherFileOfTheSameYearSizesTheSameArray(@TempDir Path dir) throws IOException, InputException {
        SizingResult means = Demos.cabin();
        WeatherYear w = means.solar().setup().weather();
        List<String> lines = new ArrayList<>();
        lines.add("# demo data: the ridge cabin's synthetic year, local standard time UTC+1");
        lines.add("hour,ghi_w_m2,dni_w_m2,dhi_w_m2,air_c");
        for (int h = 0; h < w.hours(); h++) {
            lines.add(String.format(Locale.ROOT, "%d,%s,%s,%s,%s", h, w.ghiWm2(h), w.dniWm2(h), w.dhiWm2(h), w.airTempC(h)));
        }
        Files.write(dir.resolve("cabin-weather.csv"), lines, StandardCharsets.UTF_8);
        Path demo = Path.of(Demos.CABIN);
        String text = Files.readString(demo, StandardCharsets.UTF_8)
                .replaceAll("(?m)^  monthlyGhiKwhM2Day: .*\\n", "  weatherFile: cabin-weather.csv\n")
                .replaceAll("(?m)^  monthlyAirTempC: .*\\n", "")
                .replaceAll("(?m)^  clearnessSeed: .*\\n", "")
                .replace("../load-profiles/", demo.toAbsolutePath().getParent().resolve("../load-profiles/").normalize() + "/");
        Path p = dir.resolve("cabin.yaml");
        Files.writeString(p, text, StandardCharsets.UTF_8);
        SizingResult file = Sizing.run(ProjectAssembler.assemble(ProjectReader.read(p, p.toString())));
        assertThat(file.solar().setup().resource()).contains("cabin-weather.csv");
        PvOption a = means.solar().chosen();
        PvOption b = file.solar().chosen();
        assertThat(b.module().id()).isEqualTo(a.module().id());
        assertThat(b.controller().id()).isEqualTo(a.controller().id());
        assertThat(b.candidate().totalModules()).isEqualTo(a.candidate().totalModules());
        assertThat(b.tiltDeg()).isEqualTo(a.tiltDeg());
        // Same hours; only refraction differs a little (annual mean of the hours against the mean of the 12 months).
        assertThat(b.sizing().requiredStcW()).isCloseTo(a.sizing().requiredStcW(), within(1e-3 * a.sizing().requiredStcW()));
    }

    /** An EPW file (EnergyPlus weather format) for the site sizes; one for a place far away is warned about. */
    @Test
    void anEpwFileSizesAndAFarAwayOneIsWarnedAbout(@TempDir Path dir) throws IOException, InputException {
        WeatherYear w = Demos.cabin().solar().setup().weather();
        Path demo = Path.of(Demos.CABIN);
        String base = Files.readString(demo, StandardCharsets.UTF_8)
                .replaceAll("(?m)^  monthlyGhiKwhM2Day: .*\\n", "  weatherFile: cabin.epw\n")
                .replaceAll("(?m)^  monthlyAirTempC: .*\\n", "")
                .replaceAll("(?m)^  clearnessSeed: .*\\n", "")
                .replace("../load-profiles/", demo.toAbsolutePath().getParent().resolve("../load-profiles/").normalize() + "/");
        Path p = dir.resolve("cabin.yaml");
        Files.writeString(p, base, StandardCharsets.UTF_8);
        Files.write(dir.resolve("cabin.epw"), epw(w, 46.8, 10.2), StandardCharsets.UTF_8);
        SizingResult near = Sizing.run(ProjectAssembler.assemble(ProjectReader.read(p, p.toString())));
        assertThat(near.passes()).isTrue();
        assertThat(near.input().warnings()).noneMatch(x -> x.field().equals("solar.weatherFile"));
        Files.write(dir.resolve("cabin.epw"), epw(w, 49.8, 10.2), StandardCharsets.UTF_8);
        SizingInput far = ProjectAssembler.assemble(ProjectReader.read(p, p.toString()));
        assertThat(far.warnings()).anyMatch(x -> x.field().equals("solar.weatherFile") && x.message().contains("49.80°"));
    }

    /** EPW lines (8 header lines, then one row per hour; radiation as whole Wh/m², temperature to 0.1 °C). Demo data. */
    static List<String> epw(WeatherYear w, double lat, double lon) {
        List<String> lines = new ArrayList<>();
        lines.add(String.format(Locale.ROOT, "LOCATION,Demo Ridge,XX,Demoland,demo data,000000,%.2f,%.2f,1.0,1450.0", lat, lon));
        lines.add("DESIGN CONDITIONS,0");
        lines.add("TYPICAL/EXTREME PERIODS,0");
        lines.add("GROUND TEMPERATURES,0");
        lines.add("HOLIDAYS/DAYLIGHT SAVINGS,No,0,0,0");
        lines.add("COMMENTS 1,demo data written by a test");
        lines.add("COMMENTS 2,");
        lines.add("DATA PERIODS,1,1,Data,Wednesday, 1/ 1,12/31");
        HourCalendar cal = HourCalendar.ofHours(w.hours());
        for (int h = 0; h < w.hours(); h++) {
            int day = cal.dayIndexOfHour(h);
            int m = cal.monthOfDay(day);
            int dom = day - cal.firstDayOf(m) + 1;
            lines.add(String.format(Locale.ROOT,
                    "2025,%d,%d,%d,60,?9?9?9?9E0?9?9?9*9*9?9?9?9*_?9?9*9*9*9*_*9*9,%.1f,-8.0,80,85000,0,1415,250,%.0f,%.0f,%.0f,"
                            + "0,0,0,0,180,3.0,5,5,16.0,77777,9,999999999,0,0.0,0,88,0.2,0.0,0.0",
                    m + 1, dom, h % 24 + 1, w.airTempC(h), w.ghiWm2(h), w.dniWm2(h), w.dhiWm2(h)));
        }
        return lines;
    }

    private static int indexOf(double[] a, double v) {
        for (int i = 0; i < a.length; i++) {
            if (a[i] == v) {
                return i;
            }
        }
        throw new AssertionError(v + " not tried");
    }
}
