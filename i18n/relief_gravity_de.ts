<?xml version="1.0" encoding="utf-8"?>
<!DOCTYPE TS>
<TS version="2.1" language="de">
  <context>
    <name>AnomalyGridAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="466" />
      <source>; {:.1f} GB available now</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="114" />
      <source>&lt;p&gt;Grids a numeric anomaly field (default &lt;b&gt;cba&lt;/b&gt;, mGal) of a point layer by minimum curvature with tension (Briggs 1974; Smith &amp;amp; Wessel 1990) into a float32 GeoTIFF in the stations' CRS, and optionally draws contour lines with a &lt;b&gt;value&lt;/b&gt; field (mGal).&lt;/p&gt;&lt;p&gt;&lt;b&gt;Pixel size&lt;/b&gt;: empty = half the median distance between neighbouring stations, rounded down to 1, 2, 2.5 or 5 times a power of ten. &lt;b&gt;Extent&lt;/b&gt;: empty = the stations' bounding box plus 5 % of its longer side; edges are snapped to whole cells. &lt;b&gt;Tension&lt;/b&gt;: 0 = pure minimum curvature (smoothest, may overshoot), 1 = no new extrema between stations; 0.25 suits potential-field data. &lt;b&gt;Blanking distance&lt;/b&gt;: cells farther than this from every station become NoData; empty = three times the median station spacing, 0 = no blanking. &lt;b&gt;Contour interval&lt;/b&gt;: empty = a round interval (1, 2, 2.5 or 5 times a power of ten) giving about 10 to 15 contours.&lt;/p&gt;&lt;p&gt;Limits: at most {:,} grid cells (the memory is estimated before the grid is made); at most {:,} contour levels; a field with one value everywhere is refused. The outputs may not overwrite the station layer or each other; nothing is left behind when a run fails or is cancelled.&lt;/p&gt;&lt;p&gt;Stations with an empty or non-numeric value are skipped and counted in the log; at least 3 are needed. The stations must be in a projected CRS (metres): reproject a layer in degrees first.&lt;/p&gt;&lt;p&gt;When loaded into a project the raster gets a colour ramp stretched linearly between the 2nd and 98th percentiles with bilinear smoothing, and every fifth contour is drawn heavier and labelled. The same styles ship as .qml files in the plugin's plugin/styles folder.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="480" />
      <source>A contour interval of {:g} mGal over values from {:.3f} to {:.3f} mGal gives {:,} levels (limit {:,}). Choose a larger interval, e.g. {:g} mGal, or leave it empty.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="455" />
      <source>A grid of {} x {} = {:,} cells of {:g} {} would need about {:.1f} GB of memory (limit {:,} cells{}). Choose a larger pixel size or a smaller extent.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="151" />
      <source>Anomaly field to grid (mGal)</source>
      <translation>Zu interpolierendes Anomaliefeld (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="405" />
      <source>Anomaly field {} of {} stations, gridded by minimum curvature with tension {} on {} {} cells; values in mGal; cells farther than {:.6g} {} from a station are NoData (0 = no blanking).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="99" />
      <source>Anomaly grid and contours (minimum curvature)</source>
      <translation>Anomalieraster und Isolinien (minimale Krümmung)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="203" />
      <source>Anomaly raster</source>
      <translation>Anomalieraster</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="404" />
      <source>Anomaly {} (mGal)</source>
      <translation>Anomalie {} (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="361" />
      <source>Automatic blanking distance: {:.6g} {} (3 station spacings).</source>
      <translation>Automatischer Ausblendabstand: {:.6g} {} (3 Stationsabstände).</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="185" />
      <source>Blanking distance (empty = 3 station spacings, 0 = none)</source>
      <translation>Ausblendabstand (leer = 3 Stationsabstände, 0 = keiner)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="216" />
      <source>Blanking distance used</source>
      <translation>Verwendeter Ausblendabstand</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="260" />
      <location filename="../plugin/toolbox/anomaly_grid.py" line="334" />
      <location filename="../plugin/toolbox/anomaly_grid.py" line="367" />
      <location filename="../plugin/toolbox/anomaly_grid.py" line="375" />
      <location filename="../plugin/toolbox/anomaly_grid.py" line="434" />
      <source>Cancelled by the user.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="195" />
      <source>Contour interval (mGal, empty = automatic)</source>
      <translation>Isolinienabstand (mGal, leer = automatisch)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="217" />
      <source>Contour interval used (mGal)</source>
      <translation>Verwendeter Isolinienabstand (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="208" />
      <source>Contours</source>
      <translation>Isolinien</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="419" />
      <source>Contours {} ({:g} mGal)</source>
      <translation>Isolinien {} ({:g} mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="380" />
      <source>Every cell was blanked: increase the blanking distance or set it to 0.</source>
      <translation>Alle Zellen wurden ausgeblendet: vergrößern Sie den Ausblendabstand oder setzen Sie ihn auf 0.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="314" />
      <source>Every station has the same value in {} ({:g}): a constant field has no anomaly to grid or contour. Check that the field holds the anomaly.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="145" />
      <source>Gravity stations</source>
      <translation>Schwerestationen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="169" />
      <source>Grid extent (empty = stations plus a margin)</source>
      <translation>Rasterausdehnung (leer = Stationen plus Rand)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="342" />
      <source>Grid: {} columns x {} rows of {} {} cells, tension {}.</source>
      <translation>Raster: {} Spalten x {} Zeilen zu {} {} Zellen, Spannung {}.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="108" />
      <source>Grids an anomaly field of a station layer into a styled raster and contour lines.</source>
      <translation>Interpoliert ein Anomaliefeld eines Stationslayers zu einem gestalteten Raster und Isolinien.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="105" />
      <source>Maps</source>
      <translation>Karten</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="307" />
      <source>Only {} station(s) have a value in the field {}; at least 3 are needed to grid.</source>
      <translation>Nur {} Station(en) haben einen Wert im Feld {}; zum Interpolieren sind mindestens 3 nötig.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="160" />
      <source>Pixel size (empty = automatic, from the station spacing)</source>
      <translation>Pixelgröße (leer = automatisch, aus dem Stationsabstand)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="215" />
      <source>Pixel size used</source>
      <translation>Verwendete Pixelgröße</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="214" />
      <source>Stations gridded</source>
      <translation>Interpolierte Stationen (Anzahl)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="175" />
      <source>Tension (0 = minimum curvature, 1 = no overshoot)</source>
      <translation>Spannung (0 = minimale Krümmung, 1 = kein Überschwingen)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="390" />
      <source>The anomaly raster could not be written to {}: {}</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="232" />
      <source>The stations are in a geographic CRS ({}), in degrees; gridding needs distances in metres. Reproject the station layer to a projected CRS (for example the local UTM zone) with Vector &gt; Data Management Tools &gt; Reproject Layer, then grid the copy.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="370" />
      <source>The stations cannot be gridded: {}</source>
      <translation>Die Stationen können nicht interpoliert werden: {}</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="224" />
      <location filename="../plugin/toolbox/anomaly_grid.py" line="289" />
      <source>anomaly</source>
      <translation>Anomalie</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="250" />
      <location filename="../plugin/toolbox/anomaly_grid.py" line="254" />
      <source>anomaly raster</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="252" />
      <location filename="../plugin/toolbox/anomaly_grid.py" line="256" />
      <source>contour layer</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="111" />
      <source>gravity,anomaly,bouguer,grid,raster,contour,minimum curvature,tension</source>
      <translation>Schwere,Anomalie,Bouguer,Raster,Isolinien,minimale Krümmung,Spannung</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="253" />
      <source>station layer</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="442" />
      <source>{} contour lines every {:g} mGal.</source>
      <translation>{} Isolinien im Abstand von {:g} mGal.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="301" />
      <source>{} of {} stations skipped: no geometry or no numeric value in {}.</source>
      <translation>{} von {} Stationen übersprungen: keine Geometrie oder kein Zahlenwert in {}.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="394" />
      <source>{} stations gridded; {} of {} cells have a value, from {:.3f} to {:.3f} mGal.</source>
      <translation>{} Stationen interpoliert; {} von {} Zellen haben einen Wert, von {:.3f} bis {:.3f} mGal.</translation>
    </message>
  </context>
  <context>
    <name>AnomalyMap</name>
    <message>
      <location filename="../plugin/render.py" line="142" />
      <location filename="../plugin/render.py" line="143" />
      <source>Anomaly (mGal)</source>
      <translation>Anomalie (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/map_layout.py" line="159" />
      <source>Anomaly map</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/map_layout.py" line="276" />
      <location filename="../plugin/render.py" line="185" />
      <source>Complete Bouguer anomaly</source>
      <translation>Vollständige Bouguer-Anomalie</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="146" />
      <location filename="../plugin/render.py" line="148" />
      <source>Contours (mGal)</source>
      <translation>Isolinien (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/map_layout.py" line="182" />
      <source>Coordinates: {} ({}), {}</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/render.py" line="55" />
      <source>Could not open {} as a map layer.</source>
      <translation>{} konnte nicht als Kartenlayer geöffnet werden.</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="218" />
      <source>Could not write the map image {} (layout export status {}).</source>
      <translation>Das Kartenbild {} konnte nicht geschrieben werden (Exportstatus {}).</translation>
    </message>
    <message>
      <location filename="../plugin/map_layout.py" line="58" />
      <source>Interpretation aid only: check against the survey's own ties. Drilling, groundwater and engineering decisions follow local codes and licensed practice.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/render.py" line="79" />
      <source>Reduction density {} kg/m³</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/map_layout.py" line="66" />
      <source>Reduction density … kg/m³ · standard … · contour interval … mGal · … stations · </source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/render.py" line="150" />
      <source>Stations</source>
      <translation>Stationen</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="83" />
      <source>contour interval {} mGal (index contours every {} mGal, labelled)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/map_layout.py" line="196" />
      <source>km</source>
      <translation>km</translation>
    </message>
    <message>
      <location filename="../plugin/map_layout.py" line="196" />
      <source>m</source>
      <translation>m</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="89" />
      <source>map drawn {}</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/render.py" line="87" />
      <source>no contours</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/render.py" line="89" />
      <source>reduced {}</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/render.py" line="81" />
      <source>reduction density not recorded</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/render.py" line="82" />
      <source>reduction standard not recorded</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/render.py" line="88" />
      <source>stations not shown</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/render.py" line="88" />
      <source>{} stations</source>
      <translation type="unfinished" />
    </message>
  </context>
  <context>
    <name>AnomalyStyles</name>
    <message>
      <location filename="../plugin/styling.py" line="211" />
      <source>Anomaly (mGal)</source>
      <translation>Anomalie (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/styling.py" line="276" />
      <source>Anomaly contours (mGal)</source>
      <translation>Anomalie-Isolinien (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/styling.py" line="260" />
      <source>Contour</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/styling.py" line="277" />
      <source>Contour lines of the gridded anomaly; field value in mGal.</source>
      <translation>Isolinien der interpolierten Anomalie; Feld value in mGal.</translation>
    </message>
    <message>
      <location filename="../plugin/styling.py" line="352" />
      <source>Could not save the style {}: {}</source>
      <translation>Der Stil {} konnte nicht gespeichert werden: {}</translation>
    </message>
    <message>
      <location filename="../plugin/styling.py" line="212" />
      <source>Gravity anomaly in mGal.</source>
      <translation>Schwereanomalie in mGal.</translation>
    </message>
    <message>
      <location filename="../plugin/styling.py" line="259" />
      <source>Index contour</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/styling.py" line="250" />
      <source>Index contours</source>
      <translation type="unfinished" />
    </message>
  </context>
  <context>
    <name>BouguerReductionAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="239" />
      <source>1967 formula (legacy databases)</source>
      <translation>Formel von 1967 (ältere Datenbanken)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="145" />
      <source>&lt;p&gt;Adds normal gravity, every correction and the free-air (&lt;b&gt;faa&lt;/b&gt;), simple Bouguer (&lt;b&gt;sba&lt;/b&gt;) and complete Bouguer (&lt;b&gt;cba&lt;/b&gt;) anomalies to a copy of a station point layer. All values in mGal.&lt;/p&gt;&lt;p&gt;Default standard: Hinze et al. (2005): GRS80 normal gravity, second-order height correction, atmospheric correction, spherical-cap Bouguer correction to 166.7 km (slab + curvature, LaFehr 1991) and terrain correction to 166.7 km. The 1967 formula, the first-order 0.3086 mGal/m gradient and a flat slab are options to reproduce legacy databases.&lt;/p&gt;&lt;p&gt;faa = g_obs - normal_g + height_corr + atmos_corr; sba = faa - slab_corr - curv_corr; cba = sba + tc_total.&lt;/p&gt;&lt;p&gt;The terrain correction comes from the terrain-correction field when one is chosen, otherwise from the elevation raster with the exact prism engine (inner zone to the inner radius, outer zone to the outer radius); without either, cba is left empty.&lt;/p&gt;&lt;p&gt;Station height: from the height field, or sampled from the elevation raster when no field is chosen (flagged in qc_flag). A station that cannot be reduced keeps its row with empty values and codes in qc_flag (their meaning in qc_note).&lt;/p&gt;&lt;p&gt;&lt;b&gt;Datums&lt;/b&gt;: HEIGHT_DATUM says what the station heights are (ellipsoidal, orthometric above EGM96, or orthometric with the geoid height from GEOID_FIELD or GEOID_RASTER); DEM_DATUM what the raster heights are (EGM96 as most global DEMs, the ellipsoid, or the same as the stations). EGM96 comes from PROJ's egm96_15.gtx. The reduction uses ellipsoidal heights (Hinze et al. 2005) unless the legacy orthometric option is ticked; the terrain correction compares station and DEM in the DEM's datum. Stations that disagree with the DEM beyond the local relief are flagged height_dem_mismatch.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Units and limits&lt;/b&gt;: GRAVITY_UNITS mGal, µm/s², Gal or m/s²; observed gravity must fall within 975,000-984,000 mGal after units. Densities 500-5000 kg/m³ (1000-3500 without a warning). Inner radius above 0 and below the outer radius (default 895 m, the outer edge of Hammer zone F). A run stops with a sentence when the values look like another unit.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Regional DEM&lt;/b&gt;: the standard correction reaches 166.7 km; a regional elevation raster reaching that far around every station is needed, otherwise the stations are flagged tc_partial and cba misses the far terrain.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="257" />
      <source>Apply the atmospheric correction</source>
      <translation>Atmosphärenkorrektion anbringen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="136" />
      <source>Bouguer reduction (free-air, simple and complete Bouguer anomalies)</source>
      <translation>Bouguer-Reduktion (Freiluft-, einfache und vollständige Bouguer-Anomalie)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="547" />
      <source>Check DENSITY_FIELD_UNITS (kg/m³ or g/cm³).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="324" />
      <source>Choose a station height field or an elevation raster to sample heights from.</source>
      <translation>Wählen Sie ein Feld der Stationshöhe oder ein Höhenraster, aus dem Höhen entnommen werden.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="210" />
      <source>Elevation raster (DEM, metres)</source>
      <translation>Höhenraster (DGM, Meter)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="87" />
      <source>Every observed gravity value in {} is 0: the field holds no readings. Choose the field with observed (absolute) gravity.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="270" />
      <source>Existing terrain-correction field (mGal)</source>
      <translation>Vorhandenes Feld der Geländekorrektion (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="250" />
      <source>First order, 0.3086 mGal/m</source>
      <translation>Erster Ordnung, 0,3086 mGal/m</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="237" />
      <source>GRS80 (Somigliana closed form)</source>
      <translation>GRS80 (geschlossene Formel nach Somigliana)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="72" />
      <source>Gal (1,000 mGal)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="500" />
      <source>Give densities either per station (DENSITY_FIELD) or from a geology layer (DENSITY_LAYER), not both.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="247" />
      <source>Height (free-air) correction</source>
      <translation>Höhenkorrektion (Freiluft)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="409" />
      <source>No terrain-correction field and no elevation raster: cba is left empty.</source>
      <translation>Weder Geländekorrektionsfeld noch Höhenraster: cba bleibt leer.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="235" />
      <source>Normal gravity</source>
      <translation>Normalschwere</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="188" />
      <source>Observed gravity field (mGal)</source>
      <translation>Feld der gemessenen Schwere (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="92" />
      <source>Observed gravity in {} reads {:.6g} mGal (median) with GRAVITY_UNITS = '{}', far from Earth's 975,000-984,000 mGal. The values look like {}: set GRAVITY_UNITS to '{}'.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="103" />
      <source>Observed gravity in {} reads {:.6g} mGal (median), far from Earth's 975,000-984,000 mGal in any unit: relative meter readings or another quantity? The reduction needs absolute observed gravity.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="416" />
      <source>Orthometric reduction needs geoid heights: PROJ's EGM96 grid or a geoid field/raster.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="281" />
      <source>Reduce with orthometric heights (legacy practice; the standard uses ellipsoidal heights)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="288" />
      <source>Reduced stations</source>
      <translation>Reduzierte Stationen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="139" />
      <source>Reduces observed gravity at stations to free-air, simple and complete Bouguer anomalies.</source>
      <translation>Reduziert die gemessene Schwere an Stationen auf Freiluft-, einfache und vollständige Bouguer-Anomalien.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="218" />
      <source>Reduction density field, per station</source>
      <translation>Feld der Reduktionsdichte je Station</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="249" />
      <source>Second order, latitude dependent (Hinze et al. 2005)</source>
      <translation>Zweiter Ordnung, breitenabhängig (Hinze et al. 2005)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="263" />
      <source>Spherical cap to 166.7 km (add the curvature correction to the slab)</source>
      <translation>Kugelkappe bis 166,7 km (Krümmungskorrektion zur Platte)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="201" />
      <source>Station height field (empty = sample the elevation raster)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="292" />
      <source>Stations flagged</source>
      <translation>Markierte Stationen (Anzahl)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="291" />
      <source>Stations reduced</source>
      <translation>Reduzierte Stationen (Anzahl)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="195" />
      <source>Units of observed gravity</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="226" />
      <source>Units of the density field</source>
      <translation>Einheit des Dichtefeldes</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="238" />
      <source>WGS84 (Somigliana closed form)</source>
      <translation>WGS84 (geschlossene Formel nach Somigliana)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="307" />
      <source>density</source>
      <translation>Dichte</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="350" />
      <source>elevation raster</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="227" />
      <source>g/cm³</source>
      <translation>g/cm³</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="309" />
      <source>geoid height</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="142" />
      <source>gravity,bouguer,free-air,normal gravity,terrain correction,anomaly,GRS80</source>
      <translation>Schwere,Bouguer,Freiluft,Normalschwere,Geländekorrektion,Anomalie,GRS80</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="227" />
      <source>kg/m³</source>
      <translation>kg/m³</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="72" />
      <source>m/s² (100,000 mGal)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="72" />
      <source>mGal</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="305" />
      <source>observed gravity</source>
      <translation>gemessene Schwere</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="352" />
      <source>regional elevation raster</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="306" />
      <source>station height</source>
      <translation>Stationshöhe</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="308" />
      <source>terrain correction</source>
      <translation>Geländekorrektion</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="555" />
      <source>{} station(s) have a reduction density outside {}-{} kg/m³ (e.g. {}); check the units.</source>
      <translation>{} Station(en) haben eine Reduktionsdichte außerhalb {}-{} kg/m³ (z. B. {}); prüfen Sie die Einheit.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="451" />
      <source>{} stations: {} with a free-air anomaly, {} with a complete Bouguer anomaly, {} flagged.</source>
      <translation>{} Stationen: {} mit Freiluftanomalie, {} mit vollständiger Bouguer-Anomalie, {} markiert.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="72" />
      <source>µm/s² (0.1 mGal)</source>
      <translation type="unfinished" />
    </message>
  </context>
  <context>
    <name>DensityEstimateAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="190" />
      <source>1967 formula (legacy databases)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="470" />
      <location filename="../plugin/toolbox/density_estimate.py" line="514" />
      <source>95 % interval</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="102" />
      <source>&lt;p&gt;Estimates the reduction density (kg/m³) from the stations themselves. The slab, curvature and terrain terms are computed once at 1 kg/m³ with the same standard and terrain engine as the Bouguer reduction (they are linear in density): B = slab + curvature - terrain correction per kg/m³, and the Bouguer anomaly at density ρ is faa - ρB.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Parasnis (1952)&lt;/b&gt;: least-squares regression faa = ρB + regional term; the interval is the Student-t interval of the slope.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Nettleton (1939)&lt;/b&gt;: the density whose Bouguer anomaly is uncorrelated with the station heights, over the whole survey or, with a &lt;b&gt;profile line layer&lt;/b&gt;, within a &lt;b&gt;buffer&lt;/b&gt; of each line (pooled over the lines); the interval is a bootstrap over stations (2000 resamples, seeded).&lt;/p&gt;&lt;p&gt;&lt;b&gt;Regional term&lt;/b&gt; (both methods): none, planar (default) or quadratic in the coordinates, fitted with the density so that a regional gradient does not leak into it.&lt;/p&gt;&lt;p&gt;Outputs DENSITY, DENSITY_LOW and DENSITY_HIGH (95 %) can feed the reduction's density in a model; PLOT is a PNG of the fit. The log warns when the relief is too small, when relief and regional trend cannot be told apart, and when low and high stations disagree (geology that follows the topography biases both methods).&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="208" />
      <source>Apply the atmospheric correction</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="472" />
      <source>Bouguer and terrain term per unit density (mGal per g/cm³)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="492" />
      <source>Bouguer anomaly against height</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="522" />
      <source>Bouguer anomaly minus regional, centred (mGal)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="177" />
      <source>Buffer around the profile lines</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="334" />
      <source>Cancelled by the user.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="517" />
      <source>Correlation with height</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="350" />
      <source>Density {:.0f} kg/m³, 95 % interval {:.0f} to {:.0f} kg/m³ from {} stations ({}).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="503" />
      <source>Distance along the profile (m)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="146" />
      <source>Elevation raster (DEM, metres)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="228" />
      <source>Estimated density (kg/m³)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="96" />
      <source>Estimates the Bouguer reduction density from the stations, with a 95 % interval and a figure.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="222" />
      <source>Figure of the estimate</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="201" />
      <source>First order, 0.3086 mGal/m</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="473" />
      <source>Free-air anomaly minus regional term (mGal)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="188" />
      <source>GRS80 (Somigliana closed form)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="198" />
      <source>Height (free-air) correction</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="523" />
      <source>Height (m)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="229" />
      <source>Lower bound of the 95 % interval (kg/m³)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="150" />
      <source>Method</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="153" />
      <source>Nettleton (1939) least correlation with topography</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="343" />
      <source>Nettleton correlation, {} regional term, {} group(s); bootstrap percentile interval, {} resamples</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="518" />
      <source>Nettleton: {:.0f} kg/m³ ({:.0f} to {:.0f})</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="347" />
      <source>No density can be estimated: {}</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="162" />
      <source>None (constant)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="186" />
      <source>Normal gravity</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="128" />
      <source>Observed gravity field (mGal)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="223" />
      <source>PNG files (*.png)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="152" />
      <source>Parasnis (1952) regression</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="338" />
      <source>Parasnis regression, {} regional term; Student-t interval, {} degrees of freedom</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="474" />
      <source>Parasnis: {:.0f} kg/m³ ({:.0f} to {:.0f})</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="162" />
      <source>Planar</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="399" />
      <source>Profile buffers need stations in a projected CRS (metres); reproject the station layer first.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="169" />
      <source>Profile lines (Nettleton; empty = whole survey)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="257" />
      <source>Profile lines are used by Nettleton's method only: choose it, or leave the profiles empty.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="504" />
      <source>Profile {} ({} stations)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="162" />
      <source>Quadratic</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="93" />
      <source>Reduction density from the data (Parasnis, Nettleton)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="161" />
      <source>Regional term fitted with the density</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="450" />
      <source>Relief {:.0f} m (standard deviation after the regional term); low and high stations agree.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="200" />
      <source>Second order, latitude dependent (Hinze et al. 2005)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="214" />
      <source>Spherical cap to 166.7 km (add the curvature correction to the slab)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="491" />
      <source>Station height (m)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="140" />
      <source>Station height field (above the ellipsoid; empty = sample the elevation raster)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="233" />
      <source>Stations used</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="425" />
      <source>Stations within {:g} of each profile line: {}.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="261" />
      <source>The buffer around the profile lines must be more than 0.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="252" />
      <source>The inner zone radius ({} m) must be positive and smaller than the outer zone radius ({} m).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="411" />
      <source>The profile layer has no line.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="516" />
      <source>Trial density (kg/m³)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="134" />
      <source>Units of observed gravity</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="231" />
      <source>Upper bound of the 95 % interval (kg/m³)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="189" />
      <source>WGS84 (Somigliana closed form)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="270" />
      <source>elevation raster</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="515" />
      <source>estimate {:.0f} kg/m³</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="469" />
      <source>fit: {:.0f} kg/m³</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="99" />
      <source>gravity,density,bouguer,Parasnis,Nettleton,regression,correlation,bootstrap</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="245" />
      <source>observed gravity</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="273" />
      <source>regional elevation raster</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="245" />
      <source>station height</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="468" />
      <source>stations</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="521" />
      <source>{:.0f} kg/m³</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="327" />
      <source>{} of {} stations left out (no anomaly, no terrain correction or outside the profile buffers).</source>
      <translation type="unfinished" />
    </message>
  </context>
  <context>
    <name>DensityLayer</name>
    <message>
      <location filename="../plugin/density_layer.py" line="146" />
      <source>A polygon of DENSITY_LAYER cannot be reprojected to the DEM's CRS: {}</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="133" />
      <source>DENSITY_LAYER has no coordinate reference system.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="129" />
      <source>DENSITY_LAYER has no field {}.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="111" />
      <source>DENSITY_LAYER is set but DENSITY_LAYER_FIELD is not: choose the field holding each polygon's density.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="126" />
      <source>DENSITY_LAYER must be a polygon layer.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="65" />
      <source>Density field of the geology polygons (kg/m³ or g/cm³, detected)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="57" />
      <source>Geology polygons with densities (optional; default density outside them)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="185" />
      <source>Internal: the geology polygons are not in the CRS of the raster {}.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="154" />
      <source>No polygon of DENSITY_LAYER has a density in the field {}.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="160" />
      <source>The densities of DENSITY_LAYER ({}) cannot be read: {}. Give every polygon in kg/m³ (500-5000) or every polygon in g/cm³ (0.5-5).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="131" />
      <source>The field {} of DENSITY_LAYER is not numeric.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="167" />
      <source>{} polygon(s) of DENSITY_LAYER have no density or no geometry: the default density applies there.</source>
      <translation type="unfinished" />
    </message>
  </context>
  <context>
    <name>ElevationRaster</name>
    <message>
      <location filename="../plugin/raster_io.py" line="30" />
      <source>Could not open the elevation raster {}: {}</source>
      <translation>Das Höhenraster {} konnte nicht geöffnet werden: {}</translation>
    </message>
    <message>
      <location filename="../plugin/raster_io.py" line="121" />
      <source>The elevation raster {} has no coordinate reference system.</source>
      <translation>Das Höhenraster {} hat kein Koordinatenbezugssystem.</translation>
    </message>
    <message>
      <location filename="../plugin/raster_io.py" line="38" />
      <source>The elevation raster {} is rotated; warp it to a north-up grid first.</source>
      <translation>Das Höhenraster {} ist gedreht; transformieren Sie es zuerst in ein nordorientiertes Gitter.</translation>
    </message>
    <message>
      <location filename="../plugin/raster_io.py" line="110" />
      <source>The raster {} is not a GDAL raster; save it as a GeoTIFF first.</source>
      <translation>Das Raster {} ist kein GDAL-Raster; speichern Sie es zuerst als GeoTIFF.</translation>
    </message>
  </context>
  <context>
    <name>FieldChecks</name>
    <message>
      <location filename="../plugin/toolbox/field_checks.py" line="27" />
      <source>The field '{}' chosen as the {} field is not numeric (it is {}).</source>
      <translation>Das als Feld für {1} gewählte Feld '{0}' ist nicht numerisch (es ist {2}).</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/field_checks.py" line="23" />
      <source>The station layer has no field named '{}' (chosen as the {} field). Available fields: {}.</source>
      <translation>Der Stationslayer hat kein Feld namens '{0}' (gewählt als Feld für {1}). Vorhandene Felder: {2}.</translation>
    </message>
  </context>
  <context>
    <name>GeoidHeights</name>
    <message>
      <location filename="../plugin/geoid.py" line="80" />
      <source>The EGM96 geoid grid {} was not found in PROJ's search paths ({}). Install PROJ's grid data (Debian: proj-data), or give the geoid heights in a field or raster (HEIGHT_DATUM = orthometric with GEOID_FIELD or GEOID_RASTER), or set both datums to the ellipsoid.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/geoid.py" line="96" />
      <source>The geoid heights from {} reach {:.6g} m; geoid heights lie within ±{:g} m of the ellipsoid everywhere on Earth. Check that it holds geoid heights in metres.</source>
      <translation type="unfinished" />
    </message>
  </context>
  <context>
    <name>ObservedGravityAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="100" />
      <source>&lt;p&gt;Turns gravimeter readings (counter units or mGal) into observed gravity at each station of a point layer: calibration table or scale factor, Earth tide (Longman 1959, added to the reading), reduction from the sensor to the station mark (0.3086 mGal/m or a measured gradient per station), then drift and ties to the stations of known gravity.&lt;/p&gt;&lt;p&gt;Drift: least-squares adjustment of all readings (an offset and a linear drift rate per loop, known stations as weighted observations, standard errors and residuals), or linear drift between the first and last reading of each loop's base, or none.&lt;/p&gt;&lt;p&gt;Times: ISO 8601 text (2026-05-04T09:13:00-06:00, or without an offset: then the UTC offset applies) or date-time fields. Loops: the loop field, else one loop per local calendar day. A loop opens on the station of its first reading.&lt;/p&gt;&lt;p&gt;The station output (g_obs, g_sigma in mGal, n_read, qc_flag) feeds the Bouguer reduction directly with g_obs as the gravity field. The readings output gives each reading's corrections, g_read, residual and loop.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="137" />
      <source>Calibration table (fields counter, mgal, factor)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="487" />
      <source>Could not write a reading to the readings output.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="464" />
      <source>Could not write a station to the output layer.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="392" />
      <source>Counter reading(s) outside the calibration table's range {} to {} in row(s) {} of the readings.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="134" />
      <source>Counter units (through the calibration table)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="268" />
      <source>Counter units without a calibration table or scale factor: read as mGal.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="175" />
      <source>Drift and ties</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="167" />
      <source>Earth tide</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="89" />
      <source>Field readings</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="171" />
      <source>Gravimetric factor (1 + h - 3k/2)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="153" />
      <source>Gravity stations</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="145" />
      <source>Instrument height field (m of the sensor above the mark)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="163" />
      <source>Known gravity field (absolute, mGal; empty where unknown)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="368" />
      <source>Known gravity {} is outside 970000-990000 mGal: it must be absolute gravity in mGal.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="203" />
      <source>Largest loop misclosure (mGal)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="189" />
      <source>Leave readings beyond 3 standard errors out of a second pass</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="178" />
      <source>Linear between base readings</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="168" />
      <source>Longman (1959)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="149" />
      <source>Loop field (empty: one loop per local calendar day)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="414" />
      <source>Loop, base, base readings, hours, misclosure (mGal), drift (mGal/h):</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="202" />
      <source>Loops</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="185" />
      <source>Measured vertical gradient field (mGal/m, empty: 0.3086)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="120" />
      <source>Meter readings (table)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="177" />
      <source>Network adjustment (least squares)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="408" />
      <source>No reading is of a station of known gravity (or of a station tied to one): the network cannot be tied. Give the known gravity of at least one base station read in the loops.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="361" />
      <source>No station has a known gravity in the field {}: at least one base of known gravity is needed.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="179" />
      <source>None</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="168" />
      <source>None (readings already corrected)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="83" />
      <source>Observed gravity from meter readings (tide, drift, base ties)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="125" />
      <source>Reading field</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="133" />
      <source>Reading units</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="200" />
      <source>Reduced readings</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="141" />
      <source>Scale factor (mGal per unit, or a correction to the table)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="159" />
      <source>Station height field (m, for the tide)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="156" />
      <source>Station id field</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="123" />
      <source>Station id field of the readings</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="197" />
      <source>Stations with observed gravity</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="211" />
      <source>The scale factor must be positive; got {}.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="353" />
      <source>The station id '{}' appears more than once in the station layer; ids must be unique.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="124" />
      <source>Time field (ISO 8601 text or date-time)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="92" />
      <source>Turns gravimeter readings into observed gravity at each station, with loop checks.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="129" />
      <source>UTC offset of times without one (hours, east positive)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="95" />
      <source>gravity,gravimeter,readings,earth tide,Longman,drift,loop,base station,tie,calibration</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="134" />
      <source>mGal</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="255" />
      <source>{} reading(s) name stations not in the station layer (e.g. {}); they are left out.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="330" />
      <source>{} readings in {} loops; {} stations with observed gravity; {} readings flagged; s0 = {:.4f} mGal.</source>
      <translation type="unfinished" />
    </message>
  </context>
  <context>
    <name>QualityFlags</name>
    <message>
      <location filename="../plugin/flags.py" line="72" />
      <source>A station of known gravity (a tie of the network).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="32" />
      <source>Density missing for this station: the default density was used.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="33" />
      <source>Density outside 1000-3500 kg/m3: check its units.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="40" />
      <source>Density outside 500-5000 kg/m3: no Bouguer anomaly computed for this station.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="30" />
      <source>Latitude out of range: the position cannot be located on Earth.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="77" />
      <source>No fine elevation data at the station: its terrain correction comes from the regional raster alone.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="44" />
      <source>No geoid height at the station: its heights cannot be converted between datums.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="63" />
      <source>No instrument height given for this reading: 0 m used.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="27" />
      <source>No observed gravity: no anomaly computed.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="28" />
      <source>No station height: no anomaly computed.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="45" />
      <source>No terrain correction for this station: no complete Bouguer anomaly.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="70" />
      <source>No usable reading of this station: no observed gravity.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="69" />
      <source>Not connected through any loop to a station of known gravity.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="37" />
      <source>Observed gravity outside Earth's range (975000-984000 mGal) after units: no anomaly computed.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="71" />
      <source>One reading only: no check on this station's value.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="53" />
      <source>Ring-and-sector: no elevation data at the station, so the zones finer than a DEM cell count as flat.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="61" />
      <source>Same station and time as an earlier row: this copy is left out.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="49" />
      <source>Some ring-and-sector compartments had no elevation data and count as flat.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="41" />
      <source>Station height disagrees with the DEM by more than the local relief explains (see dem_diff).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="29" />
      <source>Station height taken from the DEM (the layer gave none).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="47" />
      <source>The elevation raster has no data at the station: no terrain correction.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="48" />
      <source>The elevation rasters do not cover the whole correction area (see tc_cover).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="73" />
      <source>The elevation rasters lack data over part of the inner zone (see the inner coverage).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="50" />
      <source>The fine elevation raster has no data near the station: the regional raster filled those cells.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="67" />
      <source>The loop occupies its base once only: no closure, drift not from the base.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="68" />
      <source>The loop's drift could not be determined from its readings: none applied.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="31" />
      <source>The position could not be transformed to latitude and longitude.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="60" />
      <source>The reading is empty or not a number: left out.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="59" />
      <source>The reading names a station that is not in the station layer: left out.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="66" />
      <source>The reading was left out of the final adjustment (outlier second pass).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="65" />
      <source>The reading's residual exceeds 3 standard errors.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="26" />
      <source>The station has no point geometry.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="64" />
      <source>The station has no usable position for the tide: its readings are left out.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="34" />
      <source>The station is a multi-part point whose parts lie apart: its position is ambiguous.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="56" />
      <source>The station lies outside the anomaly raster or next to blank cells: no regional or residual value.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="46" />
      <source>The station lies outside the elevation raster: no terrain correction.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="62" />
      <source>The time is earlier than a previous row of the same loop: check it.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/flags.py" line="74" />
      <source>With water, the terrain correction uses the reference (median) density, not this station's.</source>
      <translation type="unfinished" />
    </message>
  </context>
  <context>
    <name>ReadingsTable</name>
    <message>
      <location filename="../plugin/readings_table.py" line="112" />
      <source> and {} more</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/readings_table.py" line="64" />
      <source>Cancelled by the user.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/readings_table.py" line="148" />
      <source>Row {} of the calibration table has no number in its field {}.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/readings_table.py" line="154" />
      <source>The calibration table cannot be used: {}.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/readings_table.py" line="137" />
      <source>The calibration table needs the fields counter, mgal and factor; it has {}.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/readings_table.py" line="109" />
      <source>The readings table has no rows: there is nothing to process.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/readings_table.py" line="114" />
      <source>The time of row(s) {}{} of the readings cannot be read. Accepted forms: {}, or a date-time field.</source>
      <translation type="unfinished" />
    </message>
  </context>
  <context>
    <name>RegionalResidualAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="83" />
      <source>&lt;p&gt;Splits an anomaly raster (mGal, projected CRS in metres) into a &lt;b&gt;regional&lt;/b&gt; raster and a &lt;b&gt;residual&lt;/b&gt; raster = input - regional.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Polynomial trend surface&lt;/b&gt;: a polynomial of order 1 (plane), 2 or 3 in the coordinates, fitted to every cell with a value by least squares; the robust fit reweights the cells iteratively (Huber or Tukey biweight; Holland &amp;amp; Welsch 1977) so that local anomalies do not pull the regional.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Upward continuation&lt;/b&gt;: the anomaly continued upward by &lt;b&gt;Height&lt;/b&gt; metres with the Fourier filter exp(-|k| h) (Blakely 1995). Blank cells are filled with the nearest value, the best-fitting plane is removed, and the grid is extended by mirror images (by &lt;b&gt;Padding&lt;/b&gt; times its size on each side) faded to zero by a cosine taper before the transform; blank cells stay blank.&lt;/p&gt;&lt;p&gt;Optional: sample both rasters (bilinear) at a station layer, written as a copy with the fields &lt;b&gt;regional&lt;/b&gt; and &lt;b&gt;residual&lt;/b&gt; (mGal); stations off the raster get empty values and the code outside_grid in qc_flag.&lt;/p&gt;&lt;p&gt;The choice of regional is an interpretation: state the method and its parameters with any residual map you hand on.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="104" />
      <source>Anomaly raster (mGal)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="229" />
      <location filename="../plugin/toolbox/regional_residual.py" line="308" />
      <source>Cancelled by the user.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="164" />
      <source>Choose the stations to sample, or leave the station output empty.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="129" />
      <source>Continuation height (m)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="320" />
      <source>Could not write a station to the output layer.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="123" />
      <source>Least squares</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="74" />
      <source>Maps</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="134" />
      <source>Padding on each side (fraction of the grid size)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="109" />
      <source>Polynomial trend surface</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="251" />
      <source>Regional</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="68" />
      <source>Regional and residual anomaly (trend surface or upward continuation)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="144" />
      <source>Regional anomaly</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="273" />
      <source>Regional by {}: {} cells; residual from {:.3f} to {:.3f} mGal (rms {:.3f}).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="108" />
      <source>Regional from</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="252" />
      <source>Residual</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="145" />
      <source>Residual anomaly</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="123" />
      <source>Robust, Huber weights</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="123" />
      <source>Robust, Tukey biweight</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="77" />
      <source>Splits an anomaly raster into a regional and a residual raster.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="152" />
      <source>Stations sampled</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="141" />
      <source>Stations to sample (optional)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="148" />
      <source>Stations with regional and residual</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="205" />
      <source>The anomaly raster has no cell with a value.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="174" />
      <source>The anomaly raster has no coordinate reference system.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="177" />
      <source>The anomaly raster is in a geographic CRS ({}), in degrees; both methods need cells in metres. Warp it to a projected CRS first.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="184" />
      <source>The anomaly raster is rotated; warp it to a north-up grid first.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="160" />
      <source>The continuation height must be more than 0 m (upward).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="227" />
      <source>The raster cannot be separated: {}</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="170" />
      <source>The raster {} is not a GDAL raster; save it as a GeoTIFF first.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="295" />
      <source>The stations already have a field {}; its values are replaced in the output copy.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="222" />
      <source>Trend coefficients per metre about ({:.1f}, {:.1f}): {}.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="122" />
      <source>Trend surface fit</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="115" />
      <source>Trend surface order (1-3)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="109" />
      <source>Upward continuation (FFT)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="80" />
      <source>gravity,anomaly,regional,residual,trend surface,polynomial,upward continuation,FFT</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="218" />
      <source>least squares</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="219" />
      <source>trend surface of order {} ({})</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="213" />
      <source>upward continuation by {:g} m</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="260" />
      <source>{} anomaly (mGal)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="324" />
      <source>{} of {} stations lie outside the raster or next to blank cells (qc_flag outside_grid).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="261" />
      <source>{} part of {} by {}; values in mGal; regional + residual = input.</source>
      <translation type="unfinished" />
    </message>
  </context>
  <context>
    <name>ReliefGravityAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/base.py" line="81" />
      <source>A density of {:g} kg/m³ ({}) is 1,000 times too large (g/cm³ values multiplied twice, or g/m³?): densities must lie between {:g} and {:g} kg/m³; enter {:g}.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="85" />
      <source>A density of {:g} kg/m³ ({}) is outside the accepted range {:g}-{:g} kg/m³.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="76" />
      <source>A density of {:g} kg/m³ ({}) looks like g/cm³: densities must lie between {:g} and {:g} kg/m³; enter {:g} for {:g} g/cm³.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="184" />
      <source>A geoid height field or raster is given but HEIGHT_DATUM does not use it: set HEIGHT_DATUM to 'orthometric, geoid height from GEOID_FIELD or GEOID_RASTER', or clear them.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="340" />
      <source>Cancelled by the user.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="130" />
      <source>Centimetres</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="166" />
      <source>Elevation raster heights are above</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="130" />
      <source>Feet</source>
      <translation>Fuß</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="153" />
      <source>Geoid height field (m, geoid above the ellipsoid)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="161" />
      <source>Geoid height raster (m, geoid above the ellipsoid)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="47" />
      <source>Gravity reduction</source>
      <translation>Schwerereduktion</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="120" />
      <source>Gravity stations</source>
      <translation>Schwerestationen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="179" />
      <source>HEIGHT_DATUM says the geoid height comes from a field or a raster: choose exactly one of GEOID_FIELD and GEOID_RASTER.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="129" />
      <source>Height units</source>
      <translation>Höheneinheit</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="236" />
      <source>Inner zone radius (m)</source>
      <translation>Radius der Innenzone (m)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="130" />
      <source>Metres</source>
      <translation>Meter</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="237" />
      <source>Outer zone radius (m)</source>
      <translation>Radius der Außenzone (m)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="384" />
      <source>Provenance is recorded in GeoPackage and GeoTIFF outputs only; this output has none.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="216" />
      <source>Reduction density (kg/m³)</source>
      <translation>Reduktionsdichte (kg/m³)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="232" />
      <source>Regional elevation raster for the outer zone</source>
      <translation>Regionales Höhenraster für die Außenzone</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="18" />
      <source>Results support interpretation only. Check every reduction against the survey's own ties and specifications; decisions on drilling, groundwater or engineering, and reporting under a jurisdiction's rules, are for licensed practice and local codes.</source>
      <translation>Die Ergebnisse dienen nur der Interpretation. Prüfen Sie jede Reduktion an den Anschlussmessungen und Vorgaben der Vermessung; Entscheidungen über Bohrungen, Grundwasser oder Bauvorhaben sowie Berichte nach den Regeln einer Rechtsordnung sind Sache zugelassener Fachleute und örtlicher Vorschriften.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="147" />
      <source>Station heights are</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="258" />
      <source>The inner zone radius ({} m) must be positive and smaller than the outer zone radius ({} m).</source>
      <translation>Der Radius der Innenzone ({} m) muss positiv und kleiner als der Radius der Außenzone ({} m) sein.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="301" />
      <source>The input already has a field {}; its values are replaced in the output copy.</source>
      <translation>Die Eingabe hat bereits ein Feld {}; seine Werte werden in der Ausgabekopie ersetzt.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="392" />
      <source>The provenance record could not be written: {}</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="318" />
      <source>elevation raster</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="320" />
      <source>geoid raster</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="323" />
      <source>output station layer</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="319" />
      <source>regional elevation raster</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="316" />
      <source>station layer</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="199" />
      <source>the field {}</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="207" />
      <source>the raster {}</source>
      <translation type="unfinished" />
    </message>
  </context>
  <context>
    <name>ReliefGravityProvider</name>
    <message>
      <location filename="../plugin/provider.py" line="51" />
      <source>Relief Gravity</source>
      <translation>Relief Gravity</translation>
    </message>
    <message>
      <location filename="../plugin/provider.py" line="54" />
      <source>Relief Gravity (land gravity reduction)</source>
      <translation>Relief Gravity (Reduktion von Landschweremessungen)</translation>
    </message>
  </context>
  <context>
    <name>SafeOutputs</name>
    <message>
      <location filename="../plugin/outputs.py" line="111" />
      <source>Cannot write in the folder {} of the {}: {}</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/outputs.py" line="140" />
      <source>Could not move the finished output into place at {}: {}</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/outputs.py" line="99" />
      <source>The folder {} of the {} does not exist; create it or choose another.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/outputs.py" line="103" />
      <source>The folder {} of the {} is not writable; choose a folder you may write to.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/outputs.py" line="68" />
      <source>The {} and the {} are both set to {}; choose two different files.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/outputs.py" line="59" />
      <source>The {} would be written to {}, which is the {}: writing it would destroy that input. Choose another file name.</source>
      <translation type="unfinished" />
    </message>
  </context>
  <context>
    <name>ShippedModel</name>
    <message>
      <location filename="../plugin/shipped_models.py" line="84" />
      <source>Model {} skipped: an algorithm named {} exists already.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/shipped_models.py" line="96" />
      <source>Model {} skipped: it needs {}, which is not installed.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/shipped_models.py" line="80" />
      <source>Model {} skipped: its file name must be lower-case letters, digits and underscores to serve as an algorithm name.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/shipped_models.py" line="90" />
      <source>Model {} skipped: the file could not be read as a Processing model.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/shipped_models.py" line="58" />
      <source>Models</source>
      <translation type="unfinished" />
    </message>
  </context>
  <context>
    <name>StationHeights</name>
    <message>
      <location filename="../plugin/heights.py" line="55" />
      <source>EGM96 geoid (most global DEMs)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="56" />
      <source>Ellipsoid</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="40" />
      <source>Ellipsoidal heights (e.g. from GNSS)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="272" />
      <source>Give a regional elevation raster (REGIONAL_DEM) reaching {:.1f} km around every station.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="41" />
      <source>Orthometric heights above the EGM96 geoid</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="42" />
      <source>Orthometric heights, geoid height from GEOID_FIELD or GEOID_RASTER</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="57" />
      <source>Same as the station heights</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="148" />
      <source>The elevation raster looks like heights in {} (about {:.4g} times the station heights in metres: DEM median {:.1f} against {:.1f} m). Convert it to metres (Raster Calculator: value × {}) and run again.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="274" />
      <source>The regional elevation raster does not reach {:.1f} km around these stations; extend it.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="142" />
      <source>The station heights look like metres declared in another unit (median {:.1f} m after conversion against a DEM median of {:.1f} m): set HEIGHT_UNITS to metres.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="136" />
      <source>The station heights look like {} read as metres (median {:.1f} against a DEM median of {:.1f} m at the stations): set HEIGHT_UNITS to {}.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="169" />
      <source>The {} {} cannot be read to the end (damaged or truncated file?): {}</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="186" />
      <source>The {} {} goes down to {:.6g}, deeper than any point on Earth in metres: an untagged void value or a unit error. Set its NoData value or convert it to metres.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="175" />
      <source>The {} {} has cells of {:.6g} but no NoData value: they look like voids and would be taken as heights. Set the raster's NoData value to {:.6g} (Raster &gt; Conversion &gt; Translate, 'Assign a specified NoData value') and run again.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="166" />
      <source>The {} {} holds no valid heights (every cell is NoData).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="181" />
      <source>The {} {} reaches {:.6g}, higher than any point on Earth in metres: it looks like feet or centimetres. Convert it to metres and run again.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="231" />
      <source>above</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="231" />
      <source>below</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="135" />
      <location filename="../plugin/heights.py" line="146" />
      <source>centimetres</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="135" />
      <location filename="../plugin/heights.py" line="146" />
      <source>feet</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="233" />
      <source>{:.0%} of the stations lie about one geoid height ({:.1f} m) {} the DEM: a datum setting is likely wrong. Try {} = '{}'. (Either the station heights or the DEM are on another datum than declared; see docs/datums.md.)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="218" />
      <source>{} station(s) differ from the DEM by more than the local relief explains (largest {:.1f} m; flagged height_dem_mismatch, see dem_diff).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/heights.py" line="277" />
      <source>{} station(s) have elevation data over only part of the correction area (lowest tc_cover {:.2f}); their terrain correction misses the far terrain (flagged tc_partial). {}</source>
      <translation type="unfinished" />
    </message>
  </context>
  <context>
    <name>StationTable</name>
    <message>
      <location filename="../plugin/stations.py" line="152" />
      <location filename="../plugin/stations.py" line="366" />
      <source>Cancelled by the user.</source>
      <translation>Vom Benutzer abgebrochen.</translation>
    </message>
    <message>
      <location filename="../plugin/stations.py" line="385" />
      <source>Could not write a station to the output layer.</source>
      <translation>Eine Station konnte nicht in den Ausgabelayer geschrieben werden.</translation>
    </message>
    <message>
      <location filename="../plugin/stations.py" line="260" />
      <source>Station {} has coordinates ({:.6g}, {:.6g}) that look like longitude and latitude, but the layer is declared in {} (units of metres). Assign the layer's true CRS (for example EPSG:4326) in Layer Properties &gt; Source, or reproject it.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/stations.py" line="143" />
      <source>The station layer has no coordinate reference system. Assign its CRS (Layer Properties &gt; Source) so latitudes can be computed.</source>
      <translation>Der Stationslayer hat kein Koordinatenbezugssystem. Weisen Sie sein KBS zu (Layereigenschaften &gt; Quelle), damit Breiten berechnet werden können.</translation>
    </message>
    <message>
      <location filename="../plugin/stations.py" line="164" />
      <source>The station layer has no features: there is nothing to reduce.</source>
      <translation>Der Stationslayer hat keine Objekte: es gibt nichts zu reduzieren.</translation>
    </message>
    <message>
      <location filename="../plugin/stations.py" line="298" />
      <source>The station layer holds {} geometries; stations must be points. Convert it first (for example Vector &gt; Geometry Tools &gt; Centroids) or choose the point layer.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/stations.py" line="281" />
      <source>{} station(s) lie outside the area of use of the layer's CRS {} (first: station {} at {:.6g}, {:.6g}). Their latitudes would be wrong. Check the coordinates and assign the layer's true CRS (Layer Properties &gt; Source).</source>
      <translation type="unfinished" />
    </message>
  </context>
  <context>
    <name>SurveyReportAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="70" />
      <source>&lt;p&gt;Writes one HTML file (images embedded, no external references: it opens offline in any browser) describing a station layer reduced by &lt;b&gt;bouguerreduction&lt;/b&gt;: what was run and with which parameters (read from the layers' provenance records), station counts, flags by code with their meaning and severity, the anomaly map (from &lt;b&gt;Anomaly grid&lt;/b&gt; and &lt;b&gt;Contours&lt;/b&gt; when given, else the stations coloured by their anomaly), histograms of the anomalies, the free-air and Bouguer anomalies against height, the terrain correction by zone, the uncertainty fields (tc_sigma, cba_sigma, sigma_…) when the layer has them, the flagged stations and the cautions.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Height field&lt;/b&gt;: empty = the height field recorded by the reduction, else none.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="94" />
      <source>Anomaly grid</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="164" />
      <source>Anomaly map</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="106" />
      <source>Cancelled: no report written.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="124" />
      <source>Choose a file for the report.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="97" />
      <source>Contours</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="154" />
      <source>Coordinates: {} ({}).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="166" />
      <source>Gridded anomaly with contours and stations (mGal).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="101" />
      <source>HTML files (*.html *.htm)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="61" />
      <source>Maps</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="85" />
      <source>Reduced stations</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="160" />
      <source>Rendering the anomaly map…</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="101" />
      <source>Report</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="182" />
      <source>Report written to {} ({} stations).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="90" />
      <source>Station height field (m)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="55" />
      <source>Survey report (HTML)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="151" />
      <source>The station layer has no features: nothing to report.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="117" />
      <source>The station layer has none of the fields faa, sba or cba: run the Bouguer reduction (reliefgravity:bouguerreduction) on it first and report on its output.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="64" />
      <source>Writes one self-contained HTML report of a reduced station layer: runs, flags, maps, plots.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="67" />
      <source>gravity,report,html,bouguer,anomaly,terrain,flags,uncertainty</source>
      <translation type="unfinished" />
    </message>
  </context>
  <context>
    <name>TerrainCorrectionAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="68" />
      <source>&lt;p&gt;Computes the terrain correction of every station (mGal, positive for relief above or below the station) and adds &lt;b&gt;tc_inner&lt;/b&gt;, &lt;b&gt;tc_outer&lt;/b&gt;, &lt;b&gt;tc_total&lt;/b&gt;, &lt;b&gt;dem_diff&lt;/b&gt; (station height minus DEM height, m: large values point to mislocated stations), &lt;b&gt;tc_cover&lt;/b&gt; (fraction of the zone area covered by the rasters) and &lt;b&gt;qc_flag&lt;/b&gt; to a copy of the layer.&lt;/p&gt;&lt;p&gt;Exact engine (default): the innermost ring is modelled from the station height and the local DEM surface (or replaced by a field estimate); the inner zone to the inner radius uses exact prisms at full DEM resolution; the outer zone to the outer radius uses progressively coarser cells, then the regional raster beyond the fine one, with Earth curvature. Geographic (degree) rasters work: distances are on the ground.&lt;/p&gt;&lt;p&gt;Ring-and-sector (Hammer 1939): the chosen contiguous zones out of B to M (2 m to 21.94 km, flat Earth; terrain beyond the last zone is not corrected, and the log says how far it reaches) with compartment mean heights from the DEM, and from the regional raster where the DEM has no data; zones narrower than a DEM cell hold the plane through the station with the DEM's slope. A zone counts to tc_inner when it ends within the inner zone radius; a zone the radius cuts is split there. For comparison with chart-based field practice; optionally one field per zone.&lt;/p&gt;&lt;p&gt;Station heights come from the height field (the height difference is always taken from the station's own height) or, when empty, from the DEM.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Datums&lt;/b&gt;: station heights are converted to the DEM's datum before the comparison (HEIGHT_DATUM, DEM_DATUM; EGM96 from PROJ's egm96_15.gtx). Stations differing from the DEM beyond the local relief are flagged height_dem_mismatch, and the log names the setting when most differ by about the geoid height.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Limits&lt;/b&gt;: density 500-5000 kg/m³; inner radius above 0 and below the outer radius (default 895 m, the outer edge of Hammer zone F); a regional elevation raster reaching 166.7 km is needed for the standard correction. qc_flag holds codes, qc_note their meaning.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="113" />
      <source>Elevation raster (DEM, metres)</source>
      <translation>Höhenraster (DGM, Meter)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="141" />
      <source>Exact engine (prisms, DEM-driven)</source>
      <translation>Exaktes Verfahren (Prismen, aus dem DGM)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="121" />
      <source>Field-estimated innermost-ring correction (mGal)</source>
      <translation>Im Feld geschätzte Korrektion des innersten Rings (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="205" />
      <source>Hammer zones: {}</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="139" />
      <source>Method</source>
      <translation>Verfahren</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="142" />
      <source>Ring-and-sector (Hammer 1939 zones B-M)</source>
      <translation>Ringe und Sektoren (Hammer 1939, Zonen B-M)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="221" />
      <source>Ring-and-sector zones {} cover {:.1f} m to {:.2f} km; terrain nearer (except a field-estimated innermost correction) and beyond is not corrected.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="215" />
      <source>Ring-and-sector zones {} reach {:.2f} km; terrain beyond is not corrected.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="156" />
      <source>Ring-and-sector: Hammer zones (contiguous letters out of B-M, or a range such as B-M)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="148" />
      <source>Ring-and-sector: one field per Hammer zone</source>
      <translation>Ringe und Sektoren: ein Feld je Hammer-Zone</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="106" />
      <source>Station height field (empty = sample the elevation raster)</source>
      <translation>Feld der Stationshöhe (leer = aus dem Höhenraster)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="166" />
      <source>Stations computed</source>
      <translation>Berechnete Stationen (Anzahl)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="167" />
      <source>Stations flagged</source>
      <translation>Markierte Stationen (Anzahl)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="163" />
      <source>Stations with terrain correction</source>
      <translation>Stationen mit Geländekorrektion</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="59" />
      <source>Terrain correction (inner and outer zones from elevation rasters)</source>
      <translation>Geländekorrektion (Innen- und Außenzone aus Höhenrastern)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="62" />
      <source>Terrain correction of gravity stations to 166.7 km from a DEM, with Earth curvature.</source>
      <translation>Geländekorrektion von Schwerestationen bis 166,7 km aus einem DGM, mit Erdkrümmung.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="129" />
      <source>Treat cells below sea level as water of this density (kg/m³)</source>
      <translation>Zellen unter dem Meeresspiegel als Wasser dieser Dichte behandeln (kg/m³)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="228" />
      <source>Zones {} are narrower than a DEM cell: they hold the plane through the station with the DEM's slope there instead of DEM heights.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="248" />
      <source>elevation raster</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="182" />
      <source>geoid height</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="65" />
      <source>gravity,terrain correction,inner zone,outer zone,Hammer zones,DEM,Bouguer</source>
      <translation>Schwere,Geländekorrektion,Innenzone,Außenzone,Hammer-Zonen,DGM,Bouguer</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="181" />
      <source>innermost-ring correction</source>
      <translation>Korrektion des innersten Rings</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="250" />
      <source>regional elevation raster</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="180" />
      <source>station height</source>
      <translation>Stationshöhe</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="325" />
      <source>{} stations: terrain correction computed for {}, {} flagged.</source>
      <translation>{} Stationen: Geländekorrektion für {} berechnet, {} markiert.</translation>
    </message>
  </context>
  <context>
    <name>TerrainRun</name>
    <message>
      <location filename="../plugin/terrain_run.py" line="175" />
      <source>Cancelled by the user.</source>
      <translation>Vom Benutzer abgebrochen.</translation>
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="90" />
      <source>Densities from a geology layer need the exact engine: the ring-and-sector method has one density per station. Choose the exact engine or leave DENSITY_LAYER empty.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="33" />
      <source>No station lies on the {} (raster extent {:.6g}, {:.6g}, {:.6g}, {:.6g} in its own CRS). Check that the raster covers the survey and that both layers have the right CRS.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="101" />
      <source>Reprojecting the regional elevation raster to the CRS of the fine one.</source>
      <translation>Das regionale Höhenraster wird in das KBS des feinen Rasters umprojiziert.</translation>
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="181" />
      <source>The elevation rasters stop short of the outer radius for {} station(s): the terrain they miss could add about {:.3f} mGal at worst (station {}; field tc_trunc, an estimate from the relief at the edge of coverage, not a bound). Give a regional DEM reaching {:.0f} m around every station.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="54" />
      <source>elevation raster</source>
      <translation>Höhenraster</translation>
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="201" />
      <source>height from DEM</source>
      <translation>Höhe aus DGM</translation>
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="202" />
      <source>no height (outside DEM)</source>
      <translation>keine Höhe (außerhalb des DGM)</translation>
    </message>
  </context>
  <context>
    <name>Uncertainty</name>
    <message>
      <location filename="../plugin/uncertainty_run.py" line="63" />
      <source>DEM vertical random error per cell, one sigma (m)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/uncertainty_run.py" line="84" />
      <source>Give both bounds of the density interval (DENSITY_LOW and DENSITY_HIGH), or neither.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/uncertainty_run.py" line="59" />
      <source>Observed gravity error, one sigma (mGal; a g_sigma field of the input is used instead)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/uncertainty_run.py" line="67" />
      <source>Reduction density, lower bound of its 95 % interval (kg/m³)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/uncertainty_run.py" line="71" />
      <source>Reduction density, upper bound of its 95 % interval (kg/m³)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/uncertainty_run.py" line="55" />
      <source>Station height error field (m; replaces the number where set)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/uncertainty_run.py" line="51" />
      <source>Station height error, one sigma (m)</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/uncertainty_run.py" line="86" />
      <source>The density interval {} to {} kg/m³ is impossible: the lower bound must be positive and not above the upper bound.</source>
      <translation type="unfinished" />
    </message>
  </context>
</TS>
