package org.holdover.pv;

import java.util.List;
import java.util.Objects;
import java.util.concurrent.ConcurrentHashMap;
import org.holdover.solar.PlaneOfArray;
import org.holdover.solar.PoaSeries;
import org.holdover.solar.PoaSettings;
import org.holdover.solar.SunPath;
import org.holdover.solar.WeatherYear;

/**
 * For one weather year, sun path and set of DC losses: the plane-of-array irradiance, its monthly peak-sun hours and
 * each module's monthly DC performance ratio at each orientation, each computed once. The system search sizes the PV
 * for every inverter and battery module it tries, and every one of those asks for the same orientations again; the
 * values are those of {@link PlaneOfArray#hourly} and {@link ArrayDcSeries#compute}, shared (both are immutable or
 * handed out as copies). Safe to use from several threads.
 */
public final class PlaneMemo {

    private final WeatherYear weather;
    private final SunPath sunPath;
    private final DcLosses losses;
    private final ConcurrentHashMap<PoaSettings, PoaSeries> poa = new ConcurrentHashMap<>();
    private final ConcurrentHashMap<PoaSettings, double[]> peakSunHours = new ConcurrentHashMap<>();
    private final ConcurrentHashMap<List<Object>, double[]> performanceRatio = new ConcurrentHashMap<>();

    public PlaneMemo(WeatherYear weather, SunPath sunPath, DcLosses losses) {
        this.weather = Objects.requireNonNull(weather, "weather");
        this.sunPath = Objects.requireNonNull(sunPath, "sunPath");
        this.losses = Objects.requireNonNull(losses, "losses");
    }

    /** Whether this memo was made for these inputs (the same objects). */
    public boolean isFor(WeatherYear w, SunPath s, DcLosses l) {
        return w == weather && s == sunPath && l == losses;
    }

    /** The hourly plane-of-array irradiance for the settings. */
    public PoaSeries poa(PoaSettings settings) {
        return poa.computeIfAbsent(settings, s -> PlaneOfArray.hourly(weather, sunPath, s));
    }

    /** {@link PoaSeries#monthlyPeakSunHours}(false) of the settings' irradiance (a copy). */
    public double[] peakSunHours(PoaSettings settings) {
        return peakSunHours.computeIfAbsent(settings, s -> poa(s).monthlyPeakSunHours(false)).clone();
    }

    /** The monthly DC performance ratio of one string of one module at the settings (a copy). */
    public double[] monthlyPerformanceRatio(PoaSettings settings, PvModule module) {
        return performanceRatio.computeIfAbsent(List.of(settings, module),
                k -> ArrayDcSeries.compute(new PvArray(module, 1, 1), poa(settings), weather.airTempC(), losses)
                        .monthlyDcPerformanceRatio()).clone();
    }
}
