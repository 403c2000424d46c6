// The built-in demo: an invented cold store and an invented supermarket, with made-up readings, written
// out as an ordinary spec and readings files, then built like any other spec. Every name here is fictional.

export const DEMO_SPEC = `# domeprint demo spec: edit it and rebuild with  domeprint build demo-spec.yaml -o .
# The sites, plants and readings below are invented for the demo.
defaults:
  date: 2026-12-01
  formats: [pdf, svg, png]
  dpi: 110
sheets:
  # Harbourside Cold Store (fictional): ammonia wall chart for the plant room, with the design
  # cycle and this week's readings; gauge scale for the site 12 m above sea level.
  - fluid: R717
    name: harbourside-cold-store/ammonia-wall-chart
    style: plant-room
    paper: A2
    gauge: true
    altitude: 12m
    saturationTable: true
    title: Engine room chart, low-temperature circuit
    site: Harbourside Cold Store, engine room
    author: demo
    revision: A
    cycles:
      - name: design, −28 °C / +35 °C
        evaporating: -28C
        condensing: 35C
        superheat: 6K
        subcooling: 2K
        efficiency: 0.72
        capacity: 180kW
    points: [harbourside-readings.csv]
  # Larchmont Fresh Market (fictional supermarket): CO2 booster rack, report figure with readings.
  - fluid: R744
    name: larchmont-fresh-market/co2-report-figure
    style: client-report
    paper: A4
    gauge: true
    altitude: 240m
    title: Medium-temperature rack, summer check
    client: Larchmont Fresh Market
    site: Store 7, plant deck
    notes: Readings taken by the demo engineer on an invented afternoon at 31 °C ambient.
    cycles:
      - name: design, transcritical
        evaporating: -8C
        gasCoolerOutlet: 36C
        highPressure: 92bar
        superheat: 6K
        efficiency: 0.68
    points: [larchmont-readings.csv]
  # A training handout: propane, greyscale-safe.
  - fluid: R290
    name: training/propane-handout
    style: training-handout
    paper: A4
    title: Propane (R-290) for the refrigeration course
  # A wall chart in IP units with a gauge scale: R-134a, psi, at a site 1000 ft up.
  - fluid: R134a
    name: ip-wall-chart/r134a-psi
    style: plant-room
    paper: Tabloid
    units: ip
    pressure: psi
    gauge: true
    altitude: 1000ft
    title: Chiller plant reference chart
`;

export const DEMO_READINGS: Record<string, string> = {
  "harbourside-readings.csv": `# Invented readings for the demo: Harbourside Cold Store, low-temperature circuit, Tuesday round.
@altitude: 12 m
@fluid: R717
@title: readings, Tuesday round
name,p [bar(g)],T [C],expect,note
suction,0.30,-21.5,vapour,at the compressor inlet
discharge,12.4,118.0,vapour,after the oil separator
liquid,12.2,31.5,liquid,after the receiver
`,
  "larchmont-readings.csv": `# Invented readings for the demo: Larchmont Fresh Market, medium-temperature rack.
@altitude: 240 m
@fluid: R744
@title: readings, summer check
name,p [bar(g)],T [C],expect,note
suction,27.1,-1.5,vapour,MT suction header
discharge,90.5,112.0,supercritical,compressor 2 outlet
gas cooler out,89.8,36.5,supercritical,
`,
};
