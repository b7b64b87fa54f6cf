<?xml version="1.0" encoding="utf-8"?>
<!DOCTYPE TS>
<TS version="2.1" language="de">
  <context>
    <name>AnomalyGridAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="466" />
      <source>; {:.1f} GB available now</source>
      <translation>; derzeit {:.1f} GB verfügbar</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="114" />
      <source>&lt;p&gt;Grids a numeric anomaly field (default &lt;b&gt;cba&lt;/b&gt;, mGal) of a point layer by minimum curvature with tension (Briggs 1974; Smith &amp;amp; Wessel 1990) into a float32 GeoTIFF in the stations' CRS, and optionally draws contour lines with a &lt;b&gt;value&lt;/b&gt; field (mGal).&lt;/p&gt;&lt;p&gt;&lt;b&gt;Pixel size&lt;/b&gt;: empty = half the median distance between neighbouring stations, rounded down to 1, 2, 2.5 or 5 times a power of ten. &lt;b&gt;Extent&lt;/b&gt;: empty = the stations' bounding box plus 5 % of its longer side; edges are snapped to whole cells. &lt;b&gt;Tension&lt;/b&gt;: 0 = pure minimum curvature (smoothest, may overshoot), 1 = no new extrema between stations; 0.25 suits potential-field data. &lt;b&gt;Blanking distance&lt;/b&gt;: cells farther than this from every station become NoData; empty = three times the median station spacing, 0 = no blanking. &lt;b&gt;Contour interval&lt;/b&gt;: empty = a round interval (1, 2, 2.5 or 5 times a power of ten) giving about 10 to 15 contours.&lt;/p&gt;&lt;p&gt;Limits: at most {:,} grid cells (the memory is estimated before the grid is made); at most {:,} contour levels; a field with one value everywhere is refused. The outputs may not overwrite the station layer or each other; nothing is left behind when a run fails or is cancelled.&lt;/p&gt;&lt;p&gt;Stations with an empty or non-numeric value are skipped and counted in the log; at least 3 are needed. The stations must be in a projected CRS (metres): reproject a layer in degrees first.&lt;/p&gt;&lt;p&gt;When loaded into a project the raster gets a colour ramp stretched linearly between the 2nd and 98th percentiles with bilinear smoothing, and every fifth contour is drawn heavier and labelled. The same styles ship as .qml files in the plugin's plugin/styles folder.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</source>
      <translation>&lt;p&gt;Interpoliert ein numerisches Anomaliefeld (Standard &lt;b&gt;cba&lt;/b&gt;, mGal) eines Punktlayers mit minimaler Krümmung unter Spannung (Briggs 1974; Smith &amp;amp; Wessel 1990) zu einem float32-GeoTIFF im KBS der Stationen und zeichnet optional Isolinien mit einem Feld &lt;b&gt;value&lt;/b&gt; (mGal).&lt;/p&gt;&lt;p&gt;&lt;b&gt;Pixelgröße&lt;/b&gt;: leer = der halbe mittlere (Median) Abstand benachbarter Stationen, abgerundet auf das 1-, 2-, 2,5- oder 5-Fache einer Zehnerpotenz. &lt;b&gt;Ausdehnung&lt;/b&gt;: leer = das umschließende Rechteck der Stationen plus 5 % seiner längeren Seite; die Ränder werden auf ganze Zellen gerastet. &lt;b&gt;Spannung&lt;/b&gt;: 0 = reine minimale Krümmung (am glattesten, kann überschwingen), 1 = keine neuen Extrema zwischen Stationen; 0,25 passt zu Potentialfelddaten. &lt;b&gt;Ausblendabstand&lt;/b&gt;: Zellen, die weiter als dieser Abstand von jeder Station entfernt sind, werden NoData; leer = das Dreifache des mittleren (Median) Stationsabstands, 0 = kein Ausblenden. &lt;b&gt;Isolinienabstand&lt;/b&gt;: leer = ein runder Abstand (das 1-, 2-, 2,5- oder 5-Fache einer Zehnerpotenz), der etwa 10 bis 15 Isolinien ergibt.&lt;/p&gt;&lt;p&gt;Grenzen: höchstens {:,} Rasterzellen (der Speicherbedarf wird vor dem Erstellen des Rasters geschätzt); höchstens {:,} Isolinienstufen; ein Feld mit überall demselben Wert wird abgelehnt. Die Ausgaben dürfen weder den Stationslayer noch einander überschreiben; nichts bleibt zurück, wenn ein Lauf fehlschlägt oder abgebrochen wird.&lt;/p&gt;&lt;p&gt;Stationen mit leerem oder nicht numerischem Wert werden übersprungen und im Protokoll gezählt; mindestens 3 werden benötigt. Die Stationen müssen in einem projizierten KBS (Meter) vorliegen: projizieren Sie einen Layer in Grad zuerst um.&lt;/p&gt;&lt;p&gt;Beim Laden in ein Projekt erhält das Raster einen Farbverlauf, linear gestreckt zwischen dem 2. und 98. Perzentil, mit bilinearer Glättung, und jede fünfte Isolinie wird kräftiger gezeichnet und beschriftet. Dieselben Stile liegen als .qml-Dateien im Ordner plugin/styles des Plugins.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="480" />
      <source>A contour interval of {:g} mGal over values from {:.3f} to {:.3f} mGal gives {:,} levels (limit {:,}). Choose a larger interval, e.g. {:g} mGal, or leave it empty.</source>
      <translation>Ein Isolinienabstand von {:g} mGal bei Werten von {:.3f} bis {:.3f} mGal ergibt {:,} Stufen (Grenze {:,}). Wählen Sie einen größeren Abstand, z. B. {:g} mGal, oder lassen Sie das Feld leer.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="455" />
      <source>A grid of {} x {} = {:,} cells of {:g} {} would need about {:.1f} GB of memory (limit {:,} cells{}). Choose a larger pixel size or a smaller extent.</source>
      <translation>Ein Raster von {} x {} = {:,} Zellen zu {:g} {} bräuchte etwa {:.1f} GB Speicher (Grenze {:,} Zellen{}). Wählen Sie eine größere Pixelgröße oder eine kleinere Ausdehnung.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="151" />
      <source>Anomaly field to grid (mGal)</source>
      <translation>Zu interpolierendes Anomaliefeld (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="405" />
      <source>Anomaly field {} of {} stations, gridded by minimum curvature with tension {} on {} {} cells; values in mGal; cells farther than {:.6g} {} from a station are NoData (0 = no blanking).</source>
      <translation>Anomaliefeld {} von {} Stationen, interpoliert mit minimaler Krümmung und Spannung {} auf {} {} Zellen; Werte in mGal; Zellen weiter als {:.6g} {} von einer Station entfernt sind NoData (0 = kein Ausblenden).</translation>
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
      <translation>Vom Benutzer abgebrochen.</translation>
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
      <translation>Alle Stationen haben denselben Wert in {} ({:g}): ein konstantes Feld enthält keine Anomalie zum Interpolieren oder für Isolinien. Prüfen Sie, ob das Feld die Anomalie enthält.</translation>
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
      <translation>Das Anomalieraster konnte nicht nach {} geschrieben werden: {}</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="232" />
      <source>The stations are in a geographic CRS ({}), in degrees; gridding needs distances in metres. Reproject the station layer to a projected CRS (for example the local UTM zone) with Vector &gt; Data Management Tools &gt; Reproject Layer, then grid the copy.</source>
      <translation>Die Stationen liegen in einem geographischen KBS ({}) in Grad vor; die Interpolation braucht Abstände in Metern. Projizieren Sie den Stationslayer in ein projiziertes KBS (zum Beispiel die örtliche UTM-Zone) um, mit Vektor &gt; Datenmanagement-Werkzeuge &gt; Layer reprojizieren, und interpolieren Sie dann die Kopie.</translation>
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
      <translation>Anomalieraster</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="252" />
      <location filename="../plugin/toolbox/anomaly_grid.py" line="256" />
      <source>contour layer</source>
      <translation>Isolinienlayer</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="111" />
      <source>gravity,anomaly,bouguer,grid,raster,contour,minimum curvature,tension</source>
      <translation>Schwere,Anomalie,Bouguer,Raster,Isolinien,minimale Krümmung,Spannung</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="253" />
      <source>station layer</source>
      <translation>Stationslayer</translation>
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
      <location filename="../plugin/render.py" line="158" />
      <location filename="../plugin/render.py" line="159" />
      <source>Anomaly (mGal)</source>
      <translation>Anomalie (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/map_layout.py" line="159" />
      <source>Anomaly map</source>
      <translation>Anomaliekarte</translation>
    </message>
    <message>
      <location filename="../plugin/map_layout.py" line="276" />
      <location filename="../plugin/render.py" line="205" />
      <source>Complete Bouguer anomaly</source>
      <translation>Vollständige Bouguer-Anomalie</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="162" />
      <location filename="../plugin/render.py" line="164" />
      <source>Contours (mGal)</source>
      <translation>Isolinien (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/map_layout.py" line="182" />
      <source>Coordinates: {} ({}), {}</source>
      <translation>Koordinaten: {} ({}), {}</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="56" />
      <source>Could not open {} as a map layer.</source>
      <translation>{} konnte nicht als Kartenlayer geöffnet werden.</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="238" />
      <source>Could not write the map image {} (layout export status {}).</source>
      <translation>Das Kartenbild {} konnte nicht geschrieben werden (Exportstatus {}).</translation>
    </message>
    <message>
      <location filename="../plugin/map_layout.py" line="58" />
      <source>Interpretation aid only: check against the survey's own ties. Drilling, groundwater and engineering decisions follow local codes and licensed practice.</source>
      <translation>Nur als Interpretationshilfe: an den Anschlussmessungen der Vermessung prüfen. Entscheidungen über Bohrungen, Grundwasser und Bauvorhaben folgen örtlichen Vorschriften und zugelassener Fachpraxis.</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="166" />
      <source>Outlines</source>
      <translation>Umrisse</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="88" />
      <source>Reduction density {} kg/m³</source>
      <translation>Reduktionsdichte {} kg/m³</translation>
    </message>
    <message>
      <location filename="../plugin/map_layout.py" line="66" />
      <source>Reduction density … kg/m³ · standard … · contour interval … mGal · … stations · </source>
      <translation>Reduktionsdichte … kg/m³ · Standard … · Isolinienabstand … mGal · … Stationen · </translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="170" />
      <source>Stations</source>
      <translation>Stationen</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="92" />
      <source>contour interval {} mGal (index contours every {} mGal, labelled)</source>
      <translation>Isolinienabstand {} mGal (Zähllinien alle {} mGal, beschriftet)</translation>
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
      <location filename="../plugin/render.py" line="98" />
      <source>map drawn {}</source>
      <translation>Karte erstellt {}</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="96" />
      <source>no contours</source>
      <translation>keine Isolinien</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="98" />
      <source>reduced {}</source>
      <translation>reduziert {}</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="90" />
      <source>reduction density not recorded</source>
      <translation>Reduktionsdichte nicht aufgezeichnet</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="91" />
      <source>reduction standard not recorded</source>
      <translation>Reduktionsstandard nicht aufgezeichnet</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="97" />
      <source>stations not shown</source>
      <translation>Stationen nicht dargestellt</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="97" />
      <source>{} stations</source>
      <translation>{} Stationen</translation>
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
      <translation>Isolinie</translation>
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
      <translation>Zähllinie</translation>
    </message>
    <message>
      <location filename="../plugin/styling.py" line="250" />
      <source>Index contours</source>
      <translation>Zähllinien</translation>
    </message>
  </context>
  <context>
    <name>BouguerReductionAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="145" />
      <source>&lt;p&gt;Adds normal gravity, every correction and the free-air (&lt;b&gt;faa&lt;/b&gt;), simple Bouguer (&lt;b&gt;sba&lt;/b&gt;) and complete Bouguer (&lt;b&gt;cba&lt;/b&gt;) anomalies to a copy of a station point layer. All values in mGal.&lt;/p&gt;&lt;p&gt;Default standard: Hinze et al. (2005): GRS80 normal gravity, second-order height correction, atmospheric correction, spherical-cap Bouguer correction to 166.7 km (slab + curvature, LaFehr 1991) and terrain correction to 166.7 km. The 1967 formula, the first-order 0.3086 mGal/m gradient and a flat slab are options to reproduce legacy databases.&lt;/p&gt;&lt;p&gt;faa = g_obs - normal_g + height_corr + atmos_corr; sba = faa - slab_corr - curv_corr; cba = sba + tc_total.&lt;/p&gt;&lt;p&gt;The terrain correction comes from the terrain-correction field when one is chosen, otherwise from the elevation raster with the exact prism engine (inner zone to the inner radius, outer zone to the outer radius); without either, cba is left empty.&lt;/p&gt;&lt;p&gt;Station height: from the height field, or sampled from the elevation raster when no field is chosen (flagged in qc_flag). A station that cannot be reduced keeps its row with empty values and codes in qc_flag (their meaning in qc_note).&lt;/p&gt;&lt;p&gt;&lt;b&gt;Datums&lt;/b&gt;: HEIGHT_DATUM says what the station heights are (ellipsoidal, orthometric above EGM96, or orthometric with the geoid height from GEOID_FIELD or GEOID_RASTER); DEM_DATUM what the raster heights are (EGM96 as most global DEMs, the ellipsoid, or the same as the stations). EGM96 comes from PROJ's egm96_15.gtx. The reduction uses ellipsoidal heights (Hinze et al. 2005) unless the legacy orthometric option is ticked; the terrain correction compares station and DEM in the DEM's datum. Stations that disagree with the DEM beyond the local relief are flagged height_dem_mismatch.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Units and limits&lt;/b&gt;: GRAVITY_UNITS mGal, µm/s², Gal or m/s²; observed gravity must fall within 975,000-984,000 mGal after units. Densities 500-5000 kg/m³ (1000-3500 without a warning). Inner radius above 0 and below the outer radius (default 895 m, the outer edge of Hammer zone F). A run stops with a sentence when the values look like another unit.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Regional DEM&lt;/b&gt;: the standard correction reaches 166.7 km; a regional elevation raster reaching that far around every station is needed, otherwise the stations are flagged tc_partial and cba misses the far terrain.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</source>
      <translation>&lt;p&gt;Fügt einer Kopie eines Stations-Punktlayers die Normalschwere, jede Korrektion sowie die Freiluftanomalie (&lt;b&gt;faa&lt;/b&gt;), die einfache Bouguer-Anomalie (&lt;b&gt;sba&lt;/b&gt;) und die vollständige Bouguer-Anomalie (&lt;b&gt;cba&lt;/b&gt;) hinzu. Alle Werte in mGal.&lt;/p&gt;&lt;p&gt;Standardvorgabe: Hinze et al. (2005): Normalschwere GRS80, Höhenkorrektion zweiter Ordnung, Atmosphärenkorrektion, Bouguer-Korrektion als Kugelkappe bis 166,7 km (Platte + Krümmung, LaFehr 1991) und Geländekorrektion bis 166,7 km. Die Formel von 1967, der Gradient erster Ordnung von 0,3086 mGal/m und eine ebene Platte sind Optionen, um ältere Datenbanken nachzubilden.&lt;/p&gt;&lt;p&gt;faa = g_obs - normal_g + height_corr + atmos_corr; sba = faa - slab_corr - curv_corr; cba = sba + tc_total.&lt;/p&gt;&lt;p&gt;Die Geländekorrektion stammt aus dem Geländekorrektionsfeld, wenn eines gewählt ist, sonst aus dem Höhenraster mit dem exakten Prismenverfahren (Innenzone bis zum Innenradius, Außenzone bis zum Außenradius); ohne beides bleibt cba leer.&lt;/p&gt;&lt;p&gt;Stationshöhe: aus dem Höhenfeld oder, wenn kein Feld gewählt ist, aus dem Höhenraster entnommen (in qc_flag markiert). Eine Station, die nicht reduziert werden kann, behält ihre Zeile mit leeren Werten und Codes in qc_flag (ihre Bedeutung in qc_note).&lt;/p&gt;&lt;p&gt;&lt;b&gt;Höhenbezugssysteme&lt;/b&gt;: HEIGHT_DATUM gibt an, was die Stationshöhen sind (ellipsoidisch, orthometrisch über EGM96 oder orthometrisch mit der Geoidhöhe aus GEOID_FIELD oder GEOID_RASTER); DEM_DATUM, was die Rasterhöhen sind (EGM96 wie bei den meisten globalen DGM, das Ellipsoid oder dasselbe wie die Stationen). EGM96 stammt aus egm96_15.gtx von PROJ. Die Reduktion verwendet ellipsoidische Höhen (Hinze et al. 2005), sofern die ältere orthometrische Option nicht angekreuzt ist; die Geländekorrektion vergleicht Station und DGM im Höhenbezug des DGM. Stationen, die stärker vom DGM abweichen, als das örtliche Relief erklärt, werden mit height_dem_mismatch markiert.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Einheiten und Grenzen&lt;/b&gt;: GRAVITY_UNITS mGal, µm/s², Gal oder m/s²; die gemessene Schwere muss nach der Umrechnung innerhalb 975.000-984.000 mGal liegen. Dichten 500-5000 kg/m³ (1000-3500 ohne Warnung). Innenradius über 0 und unter dem Außenradius (Standard 895 m, der äußere Rand der Hammer-Zone F). Ein Lauf bricht mit einer Meldung ab, wenn die Werte nach einer anderen Einheit aussehen.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Regionales DGM&lt;/b&gt;: die Standardkorrektion reicht bis 166,7 km; ein regionales Höhenraster, das so weit um jede Station reicht, wird benötigt, sonst werden die Stationen mit tc_partial markiert und cba fehlt das ferne Gelände.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="136" />
      <source>Bouguer reduction (free-air, simple and complete Bouguer anomalies)</source>
      <translation>Bouguer-Reduktion (Freiluft-, einfache und vollständige Bouguer-Anomalie)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="515" />
      <source>Check DENSITY_FIELD_UNITS (kg/m³ or g/cm³).</source>
      <translation>Prüfen Sie DENSITY_FIELD_UNITS (kg/m³ oder g/cm³).</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="291" />
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
      <translation>Alle Werte der gemessenen Schwere in {} sind 0: das Feld enthält keine Messwerte. Wählen Sie das Feld mit der gemessenen (absoluten) Schwere.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="236" />
      <source>Existing terrain-correction field (mGal)</source>
      <translation>Vorhandenes Feld der Geländekorrektion (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="72" />
      <source>Gal (1,000 mGal)</source>
      <translation>Gal (1.000 mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="468" />
      <source>Give densities either per station (DENSITY_FIELD) or from a geology layer (DENSITY_LAYER), not both.</source>
      <translation>Geben Sie Dichten entweder je Station (DENSITY_FIELD) oder aus einem Geologielayer (DENSITY_LAYER) an, nicht beides.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="377" />
      <source>No terrain-correction field and no elevation raster: cba is left empty.</source>
      <translation>Weder Geländekorrektionsfeld noch Höhenraster: cba bleibt leer.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="188" />
      <source>Observed gravity field (mGal)</source>
      <translation>Feld der gemessenen Schwere (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="92" />
      <source>Observed gravity in {} reads {:.6g} mGal (median) with GRAVITY_UNITS = '{}', far from Earth's 975,000-984,000 mGal. The values look like {}: set GRAVITY_UNITS to '{}'.</source>
      <translation>Die gemessene Schwere in {} beträgt {:.6g} mGal (Median) bei GRAVITY_UNITS = '{}', weit entfernt von den 975.000-984.000 mGal der Erde. Die Werte sehen aus wie {}: setzen Sie GRAVITY_UNITS auf '{}'.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="103" />
      <source>Observed gravity in {} reads {:.6g} mGal (median), far from Earth's 975,000-984,000 mGal in any unit: relative meter readings or another quantity? The reduction needs absolute observed gravity.</source>
      <translation>Die gemessene Schwere in {} beträgt {:.6g} mGal (Median), in jeder Einheit weit entfernt von den 975.000-984.000 mGal der Erde: relative Gravimeterablesungen oder eine andere Größe? Die Reduktion braucht die absolute gemessene Schwere.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="384" />
      <source>Orthometric reduction needs geoid heights: PROJ's EGM96 grid or a geoid field/raster.</source>
      <translation>Die orthometrische Reduktion braucht Geoidhöhen: das EGM96-Gitter von PROJ oder ein Geoidhöhenfeld bzw. -raster.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="248" />
      <source>Reduce with orthometric heights (legacy practice; the standard uses ellipsoidal heights)</source>
      <translation>Mit orthometrischen Höhen reduzieren (ältere Praxis; der Standard verwendet ellipsoidische Höhen)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="255" />
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
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="201" />
      <source>Station height field (empty = sample the elevation raster)</source>
      <translation>Feld der Stationshöhe (leer = aus dem Höhenraster)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="259" />
      <source>Stations flagged</source>
      <translation>Markierte Stationen (Anzahl)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="258" />
      <source>Stations reduced</source>
      <translation>Reduzierte Stationen (Anzahl)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="195" />
      <source>Units of observed gravity</source>
      <translation>Einheit der gemessenen Schwere</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="226" />
      <source>Units of the density field</source>
      <translation>Einheit des Dichtefeldes</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="274" />
      <source>density</source>
      <translation>Dichte</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="317" />
      <source>elevation raster</source>
      <translation>Höhenraster</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="227" />
      <source>g/cm³</source>
      <translation>g/cm³</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="276" />
      <source>geoid height</source>
      <translation>Geoidhöhe</translation>
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
      <translation>m/s² (100.000 mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="72" />
      <source>mGal</source>
      <translation>mGal</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="272" />
      <source>observed gravity</source>
      <translation>gemessene Schwere</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="319" />
      <source>regional elevation raster</source>
      <translation>regionales Höhenraster</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="273" />
      <source>station height</source>
      <translation>Stationshöhe</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="275" />
      <source>terrain correction</source>
      <translation>Geländekorrektion</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="523" />
      <source>{} station(s) have a reduction density outside {}-{} kg/m³ (e.g. {}); check the units.</source>
      <translation>{} Station(en) haben eine Reduktionsdichte außerhalb {}-{} kg/m³ (z. B. {}); prüfen Sie die Einheit.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="419" />
      <source>{} stations: {} with a free-air anomaly, {} with a complete Bouguer anomaly, {} flagged.</source>
      <translation>{} Stationen: {} mit Freiluftanomalie, {} mit vollständiger Bouguer-Anomalie, {} markiert.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="72" />
      <source>µm/s² (0.1 mGal)</source>
      <translation>µm/s² (0,1 mGal)</translation>
    </message>
  </context>
  <context>
    <name>DensityEstimateAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="471" />
      <location filename="../plugin/toolbox/density_estimate.py" line="515" />
      <source>95 % interval</source>
      <translation>95-%-Intervall</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="103" />
      <source>&lt;p&gt;Estimates the reduction density (kg/m³) from the stations themselves. The slab, curvature and terrain terms are computed once at 1 kg/m³ with the same standard and terrain engine as the Bouguer reduction (they are linear in density): B = slab + curvature - terrain correction per kg/m³, and the Bouguer anomaly at density ρ is faa - ρB.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Parasnis (1952)&lt;/b&gt;: least-squares regression faa = ρB + regional term; the interval is the Student-t interval of the slope.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Nettleton (1939)&lt;/b&gt;: the density whose Bouguer anomaly is uncorrelated with the station heights, over the whole survey or, with a &lt;b&gt;profile line layer&lt;/b&gt;, within a &lt;b&gt;buffer&lt;/b&gt; of each line (pooled over the lines); the interval is a bootstrap over stations (2000 resamples, seeded).&lt;/p&gt;&lt;p&gt;&lt;b&gt;Regional term&lt;/b&gt; (both methods): none, planar (default) or quadratic in the coordinates, fitted with the density so that a regional gradient does not leak into it.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Areas left out&lt;/b&gt; (optional polygons): stations inside them are left out of the fit, e.g. those on mapped valley fill or on a mapped intrusion, whose density is not the one being estimated.&lt;/p&gt;&lt;p&gt;Outputs DENSITY, DENSITY_LOW and DENSITY_HIGH (95 %) can feed the reduction's density in a model; PLOT is a PNG of the fit. The log warns when the relief is too small, when relief and regional trend cannot be told apart, and when low and high stations disagree (geology that follows the topography biases both methods).&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</source>
      <translation>&lt;p&gt;Schätzt die Reduktionsdichte (kg/m³) aus den Stationen selbst. Platten-, Krümmungs- und Geländeterm werden einmal für 1 kg/m³ mit demselben Standard und demselben Geländeverfahren wie die Bouguer-Reduktion berechnet (sie sind linear in der Dichte): B = Platte + Krümmung - Geländekorrektion je kg/m³, und die Bouguer-Anomalie bei der Dichte ρ ist faa - ρB.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Parasnis (1952)&lt;/b&gt;: Regression nach kleinsten Quadraten faa = ρB + Regionalterm; das Intervall ist das Student-t-Intervall der Steigung.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Nettleton (1939)&lt;/b&gt;: die Dichte, deren Bouguer-Anomalie nicht mit den Stationshöhen korreliert, über die ganze Vermessung oder, mit einem &lt;b&gt;Profillinienlayer&lt;/b&gt;, innerhalb eines &lt;b&gt;Puffers&lt;/b&gt; um jede Linie (über die Linien zusammengefasst); das Intervall ist ein Bootstrap über die Stationen (2000 Stichproben, mit festem Startwert).&lt;/p&gt;&lt;p&gt;&lt;b&gt;Regionalterm&lt;/b&gt; (beide Verfahren): keiner, eben (Standard) oder quadratisch in den Koordinaten, gemeinsam mit der Dichte angepasst, damit ein regionaler Gradient nicht in sie einfließt.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Ausgelassene Flächen&lt;/b&gt; (optionale Polygone): Stationen darin gehen nicht in die Anpassung ein, z. B. solche auf kartierter Talfüllung oder auf einer kartierten Intrusion, deren Dichte nicht die gesuchte ist.&lt;/p&gt;&lt;p&gt;Die Ausgaben DENSITY, DENSITY_LOW und DENSITY_HIGH (95 %) können in einem Modell die Dichte der Reduktion speisen; PLOT ist ein PNG der Anpassung. Das Protokoll warnt, wenn das Relief zu gering ist, wenn Relief und regionaler Trend nicht zu trennen sind und wenn tiefe und hohe Stationen nicht übereinstimmen (eine Geologie, die der Topographie folgt, verfälscht beide Verfahren).&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="190" />
      <source>Areas whose stations are left out (e.g. mapped valley fill; optional)</source>
      <translation>Flächen, deren Stationen ausgelassen werden (z. B. kartierte Talfüllung; optional)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="473" />
      <source>Bouguer and terrain term per unit density (mGal per g/cm³)</source>
      <translation>Bouguer- und Geländeterm je Dichteeinheit (mGal je g/cm³)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="493" />
      <source>Bouguer anomaly against height</source>
      <translation>Bouguer-Anomalie gegen Höhe</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="523" />
      <source>Bouguer anomaly minus regional, centred (mGal)</source>
      <translation>Bouguer-Anomalie minus Regionalfeld, zentriert (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="181" />
      <source>Buffer around the profile lines</source>
      <translation>Puffer um die Profillinien</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="315" />
      <source>Cancelled by the user.</source>
      <translation>Vom Benutzer abgebrochen.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="518" />
      <source>Correlation with height</source>
      <translation>Korrelation mit der Höhe</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="331" />
      <source>Density {:.0f} kg/m³, 95 % interval {:.0f} to {:.0f} kg/m³ from {} stations ({}).</source>
      <translation>Dichte {:.0f} kg/m³, 95-%-Intervall {:.0f} bis {:.0f} kg/m³ aus {} Stationen ({}).</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="504" />
      <source>Distance along the profile (m)</source>
      <translation>Abstand entlang des Profils (m)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="150" />
      <source>Elevation raster (DEM, metres)</source>
      <translation>Höhenraster (DGM, Meter)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="206" />
      <source>Estimated density (kg/m³)</source>
      <translation>Geschätzte Dichte (kg/m³)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="97" />
      <source>Estimates the Bouguer reduction density from the stations, with a 95 % interval and a figure.</source>
      <translation>Schätzt die Bouguer-Reduktionsdichte aus den Stationen, mit 95-%-Intervall und Abbildung.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="381" />
      <source>Every station lies inside EXCLUDE_AREAS: no station is left to estimate the density from.</source>
      <translation>Jede Station liegt in EXCLUDE_AREAS: keine Station bleibt, aus der sich die Dichte schätzen ließe.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="200" />
      <source>Figure of the estimate</source>
      <translation>Abbildung der Schätzung</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="474" />
      <source>Free-air anomaly minus regional term (mGal)</source>
      <translation>Freiluftanomalie minus Regionalterm (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="524" />
      <source>Height (m)</source>
      <translation>Höhe (m)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="207" />
      <source>Lower bound of the 95 % interval (kg/m³)</source>
      <translation>Untere Grenze des 95-%-Intervalls (kg/m³)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="154" />
      <source>Method</source>
      <translation>Verfahren</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="157" />
      <source>Nettleton (1939) least correlation with topography</source>
      <translation>Nettleton (1939), geringste Korrelation mit der Topographie</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="324" />
      <source>Nettleton correlation, {} regional term, {} group(s); bootstrap percentile interval, {} resamples</source>
      <translation>Nettleton-Korrelation, Regionalterm {}, {} Gruppe(n); Bootstrap-Perzentilintervall, {} Stichproben</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="519" />
      <source>Nettleton: {:.0f} kg/m³ ({:.0f} to {:.0f})</source>
      <translation>Nettleton: {:.0f} kg/m³ ({:.0f} bis {:.0f})</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="328" />
      <source>No density can be estimated: {}</source>
      <translation>Es kann keine Dichte geschätzt werden: {}</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="166" />
      <source>None (constant)</source>
      <translation>Keiner (konstant)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="132" />
      <source>Observed gravity field (mGal)</source>
      <translation>Feld der gemessenen Schwere (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="201" />
      <source>PNG files (*.png)</source>
      <translation>PNG-Dateien (*.png)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="156" />
      <source>Parasnis (1952) regression</source>
      <translation>Parasnis (1952), Regression</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="319" />
      <source>Parasnis regression, {} regional term; Student-t interval, {} degrees of freedom</source>
      <translation>Parasnis-Regression, Regionalterm {}; Student-t-Intervall, {} Freiheitsgrade</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="475" />
      <source>Parasnis: {:.0f} kg/m³ ({:.0f} to {:.0f})</source>
      <translation>Parasnis: {:.0f} kg/m³ ({:.0f} bis {:.0f})</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="166" />
      <source>Planar</source>
      <translation>Eben</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="400" />
      <source>Profile buffers need stations in a projected CRS (metres); reproject the station layer first.</source>
      <translation>Profilpuffer brauchen Stationen in einem projizierten KBS (Meter); projizieren Sie den Stationslayer zuerst um.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="173" />
      <source>Profile lines (Nettleton; empty = whole survey)</source>
      <translation>Profillinien (Nettleton; leer = ganze Vermessung)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="235" />
      <source>Profile lines are used by Nettleton's method only: choose it, or leave the profiles empty.</source>
      <translation>Profillinien werden nur vom Nettleton-Verfahren verwendet: wählen Sie es oder lassen Sie die Profile leer.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="505" />
      <source>Profile {} ({} stations)</source>
      <translation>Profil {} ({} Stationen)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="166" />
      <source>Quadratic</source>
      <translation>Quadratisch</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="94" />
      <source>Reduction density from the data (Parasnis, Nettleton)</source>
      <translation>Reduktionsdichte aus den Daten (Parasnis, Nettleton)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="165" />
      <source>Regional term fitted with the density</source>
      <translation>Mit der Dichte angepasster Regionalterm</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="451" />
      <source>Relief {:.0f} m (standard deviation after the regional term); low and high stations agree.</source>
      <translation>Relief {:.0f} m (Standardabweichung nach dem Regionalterm); tiefe und hohe Stationen stimmen überein.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="492" />
      <source>Station height (m)</source>
      <translation>Stationshöhe (m)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="144" />
      <source>Station height field (above the ellipsoid; empty = sample the elevation raster)</source>
      <translation>Feld der Stationshöhe (über dem Ellipsoid; leer = aus dem Höhenraster)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="211" />
      <source>Stations used</source>
      <translation>Verwendete Stationen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="426" />
      <source>Stations within {:g} of each profile line: {}.</source>
      <translation>Stationen innerhalb {:g} um jede Profillinie: {}.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="239" />
      <source>The buffer around the profile lines must be more than 0.</source>
      <translation>Der Puffer um die Profillinien muss größer als 0 sein.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="230" />
      <source>The inner zone radius ({} m) must be positive and smaller than the outer zone radius ({} m).</source>
      <translation>Der Radius der Innenzone ({} m) muss positiv und kleiner als der Radius der Außenzone ({} m) sein.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="412" />
      <source>The profile layer has no line.</source>
      <translation>Der Profillayer enthält keine Linie.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="517" />
      <source>Trial density (kg/m³)</source>
      <translation>Versuchsdichte (kg/m³)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="138" />
      <source>Units of observed gravity</source>
      <translation>Einheit der gemessenen Schwere</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="209" />
      <source>Upper bound of the 95 % interval (kg/m³)</source>
      <translation>Obere Grenze des 95-%-Intervalls (kg/m³)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="248" />
      <source>elevation raster</source>
      <translation>Höhenraster</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="516" />
      <source>estimate {:.0f} kg/m³</source>
      <translation>Schätzung {:.0f} kg/m³</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="470" />
      <source>fit: {:.0f} kg/m³</source>
      <translation>Anpassung: {:.0f} kg/m³</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="100" />
      <source>gravity,density,bouguer,Parasnis,Nettleton,regression,correlation,bootstrap</source>
      <translation>Schwere,Dichte,Bouguer,Parasnis,Nettleton,Regression,Korrelation,Bootstrap</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="223" />
      <source>observed gravity</source>
      <translation>gemessene Schwere</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="251" />
      <source>regional elevation raster</source>
      <translation>regionales Höhenraster</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="223" />
      <source>station height</source>
      <translation>Stationshöhe</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="469" />
      <source>stations</source>
      <translation>Stationen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="522" />
      <source>{:.0f} kg/m³</source>
      <translation>{:.0f} kg/m³</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="307" />
      <source>{} of {} stations left out (no anomaly, no terrain correction, outside the profile buffers or inside the excluded areas).</source>
      <translation>{} von {} Stationen ausgelassen (keine Anomalie, keine Geländekorrektion, außerhalb der Profilpuffer oder in den ausgelassenen Flächen).</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/density_estimate.py" line="384" />
      <source>{} of {} stations lie inside EXCLUDE_AREAS and are left out of the fit.</source>
      <translation>{} von {} Stationen liegen in EXCLUDE_AREAS und gehen nicht in die Anpassung ein.</translation>
    </message>
  </context>
  <context>
    <name>DensityLayer</name>
    <message>
      <location filename="../plugin/density_layer.py" line="146" />
      <source>A polygon of DENSITY_LAYER cannot be reprojected to the DEM's CRS: {}</source>
      <translation>Ein Polygon von DENSITY_LAYER kann nicht in das KBS des DGM umprojiziert werden: {}</translation>
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="133" />
      <source>DENSITY_LAYER has no coordinate reference system.</source>
      <translation>DENSITY_LAYER hat kein Koordinatenbezugssystem.</translation>
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="129" />
      <source>DENSITY_LAYER has no field {}.</source>
      <translation>DENSITY_LAYER hat kein Feld {}.</translation>
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="111" />
      <source>DENSITY_LAYER is set but DENSITY_LAYER_FIELD is not: choose the field holding each polygon's density.</source>
      <translation>DENSITY_LAYER ist gesetzt, DENSITY_LAYER_FIELD aber nicht: wählen Sie das Feld mit der Dichte jedes Polygons.</translation>
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="126" />
      <source>DENSITY_LAYER must be a polygon layer.</source>
      <translation>DENSITY_LAYER muss ein Polygonlayer sein.</translation>
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="65" />
      <source>Density field of the geology polygons (kg/m³ or g/cm³, detected)</source>
      <translation>Dichtefeld der Geologiepolygone (kg/m³ oder g/cm³, wird erkannt)</translation>
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="57" />
      <source>Geology polygons with densities (optional; default density outside them)</source>
      <translation>Geologiepolygone mit Dichten (optional; außerhalb gilt die Standarddichte)</translation>
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="185" />
      <source>Internal: the geology polygons are not in the CRS of the raster {}.</source>
      <translation>Intern: die Geologiepolygone liegen nicht im KBS des Rasters {}.</translation>
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="154" />
      <source>No polygon of DENSITY_LAYER has a density in the field {}.</source>
      <translation>Kein Polygon von DENSITY_LAYER hat eine Dichte im Feld {}.</translation>
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="160" />
      <source>The densities of DENSITY_LAYER ({}) cannot be read: {}. Give every polygon in kg/m³ (500-5000) or every polygon in g/cm³ (0.5-5).</source>
      <translation>Die Dichten von DENSITY_LAYER ({}) können nicht gelesen werden: {}. Geben Sie alle Polygone in kg/m³ (500-5000) oder alle in g/cm³ (0,5-5) an.</translation>
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="131" />
      <source>The field {} of DENSITY_LAYER is not numeric.</source>
      <translation>Das Feld {} von DENSITY_LAYER ist nicht numerisch.</translation>
    </message>
    <message>
      <location filename="../plugin/density_layer.py" line="167" />
      <source>{} polygon(s) of DENSITY_LAYER have no density or no geometry: the default density applies there.</source>
      <translation>{} Polygon(e) von DENSITY_LAYER haben keine Dichte oder keine Geometrie: dort gilt die Standarddichte.</translation>
    </message>
  </context>
  <context>
    <name>ElevationRaster</name>
    <message>
      <location filename="../plugin/raster_io.py" line="32" />
      <source>Could not open the elevation raster {}: {}</source>
      <translation>Das Höhenraster {} konnte nicht geöffnet werden: {}</translation>
    </message>
    <message>
      <location filename="../plugin/raster_io.py" line="51" />
      <source>The elevation raster {} has no coordinate reference system.</source>
      <translation>Das Höhenraster {} hat kein Koordinatenbezugssystem.</translation>
    </message>
    <message>
      <location filename="../plugin/raster_io.py" line="29" />
      <source>The elevation raster {} is rotated; warp it to a north-up grid first.</source>
      <translation>Das Höhenraster {} ist gedreht; transformieren Sie es zuerst in ein nordorientiertes Gitter.</translation>
    </message>
    <message>
      <location filename="../plugin/raster_io.py" line="40" />
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
      <location filename="../plugin/geoid.py" line="36" />
      <source>The EGM96 geoid grid {} was not found in PROJ's search paths ({}). Install PROJ's grid data (Debian: proj-data), or give the geoid heights in a field or raster (HEIGHT_DATUM = orthometric with GEOID_FIELD or GEOID_RASTER), or set both datums to the ellipsoid.</source>
      <translation>Das EGM96-Geoidgitter {} wurde in den Suchpfaden von PROJ ({}) nicht gefunden. Installieren Sie die Gitterdaten von PROJ (Debian: proj-data), geben Sie die Geoidhöhen in einem Feld oder Raster an (HEIGHT_DATUM = orthometrisch mit GEOID_FIELD oder GEOID_RASTER) oder setzen Sie beide Höhenbezüge auf das Ellipsoid.</translation>
    </message>
    <message>
      <location filename="../plugin/geoid.py" line="51" />
      <source>The geoid heights from {} reach {:.6g} m; geoid heights lie within ±{:g} m of the ellipsoid everywhere on Earth. Check that it holds geoid heights in metres.</source>
      <translation>Die Geoidhöhen aus {} erreichen {:.6g} m; Geoidhöhen liegen überall auf der Erde innerhalb ±{:g} m um das Ellipsoid. Prüfen Sie, ob es Geoidhöhen in Metern enthält.</translation>
    </message>
  </context>
  <context>
    <name>ObservedGravityAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="110" />
      <source>&lt;p&gt;Turns gravimeter readings (counter units or mGal) into observed gravity at each station of a point layer: calibration table or scale factor, Earth tide (Longman 1959, or the Sun and Moon from Meeus's 1998 series with the exact attraction, within about 0.0001 mGal of a modern ephemeris where Longman's series errs by up to 0.003 mGal; added to the reading), reduction from the sensor to the station mark (0.3086 mGal/m or a measured gradient per station), then drift and ties to the stations of known gravity.&lt;/p&gt;&lt;p&gt;Drift: least-squares adjustment of all readings (an offset and a linear drift rate per loop, known stations as weighted observations, standard errors and residuals), or linear drift between the first and last reading of each loop's base, or none.&lt;/p&gt;&lt;p&gt;Times: ISO 8601 text (2026-05-04T09:13:00-06:00, or without an offset: then the UTC offset applies) or date-time fields. Loops: the loop field, else one loop per local calendar day. A loop opens on the station of its first reading.&lt;/p&gt;&lt;p&gt;The station output (g_obs, g_sigma in mGal, n_read, qc_flag) feeds the Bouguer reduction directly with g_obs as the gravity field. The readings output gives each reading's corrections, g_read, residual and loop.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</source>
      <translation>&lt;p&gt;Wandelt Gravimeterablesungen (Zählereinheiten oder mGal) in die gemessene Schwere an jeder Station eines Punktlayers um: Kalibriertabelle oder Maßstabsfaktor, Erdgezeiten (Longman 1959, oder Sonne und Mond aus der Reihe von Meeus 1998 mit der exakten Anziehung, auf etwa 0,0001 mGal an einer modernen Ephemeride, wo Longmans Reihe bis zu 0,003 mGal abweicht; zur Ablesung addiert), Reduktion vom Sensor auf die Stationsvermarkung (0,3086 mGal/m oder ein gemessener Gradient je Station), dann Drift und Anschluss an die Stationen bekannter Schwere.&lt;/p&gt;&lt;p&gt;Drift: Ausgleichung aller Ablesungen nach kleinsten Quadraten (ein Offset und eine lineare Driftrate je Schleife, bekannte Stationen als gewichtete Beobachtungen, Standardfehler und Residuen), oder lineare Drift zwischen der ersten und letzten Ablesung der Basis jeder Schleife, oder keine.&lt;/p&gt;&lt;p&gt;Zeiten: ISO-8601-Text (2026-05-04T09:13:00-06:00, oder ohne Versatz: dann gilt der UTC-Versatz) oder Datum/Zeit-Felder. Schleifen: das Schleifenfeld, sonst eine Schleife je örtlichem Kalendertag. Eine Schleife beginnt an der Station ihrer ersten Ablesung.&lt;/p&gt;&lt;p&gt;Die Stationsausgabe (g_obs, g_sigma in mGal, n_read, qc_flag) geht mit g_obs als Schwerefeld direkt in die Bouguer-Reduktion ein. Die Ausgabe der Ablesungen enthält die Korrektionen jeder Ablesung, g_read, Residuum und Schleife.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="215" />
      <source>A-priori standard error of a known gravity value (mGal)</source>
      <translation>A-priori-Standardabweichung eines bekannten Schwerewerts (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="210" />
      <source>A-priori standard error of one reading (mGal, network adjustment)</source>
      <translation>A-priori-Standardabweichung einer Ablesung (mGal, Netzausgleich)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="149" />
      <source>Calibration table (fields counter, mgal, factor)</source>
      <translation>Kalibriertabelle (Felder counter, mgal, factor)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="530" />
      <source>Could not write a reading to the readings output.</source>
      <translation>Eine Ablesung konnte nicht in die Ausgabe der Ablesungen geschrieben werden.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="507" />
      <source>Could not write a station to the output layer.</source>
      <translation>Eine Station konnte nicht in den Ausgabelayer geschrieben werden.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="424" />
      <source>Counter reading(s) outside the calibration table's range {} to {} in row(s) {} of the readings.</source>
      <translation>Zählerablesung(en) außerhalb des Bereichs der Kalibriertabelle von {} bis {} in Zeile(n) {} der Ablesungen.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="146" />
      <source>Counter units (through the calibration table)</source>
      <translation>Zählereinheiten (über die Kalibriertabelle)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="295" />
      <source>Counter units without a calibration table or scale factor: read as mGal.</source>
      <translation>Zählereinheiten ohne Kalibriertabelle oder Maßstabsfaktor: als mGal gelesen.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="192" />
      <source>Drift and ties</source>
      <translation>Drift und Anschlüsse</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="179" />
      <source>Earth tide</source>
      <translation>Erdgezeiten</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="99" />
      <source>Field readings</source>
      <translation>Feldablesungen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="188" />
      <source>Gravimetric factor (1 + h - 3k/2)</source>
      <translation>Gravimetrischer Faktor (1 + h - 3k/2)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="165" />
      <source>Gravity stations</source>
      <translation>Schwerestationen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="157" />
      <source>Instrument height field (m of the sensor above the mark)</source>
      <translation>Feld der Instrumentenhöhe (m des Sensors über der Vermarkung)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="175" />
      <source>Known gravity field (absolute, mGal; empty where unknown)</source>
      <translation>Feld der bekannten Schwere (absolut, mGal; leer, wo unbekannt)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="400" />
      <source>Known gravity {} is outside 970000-990000 mGal: it must be absolute gravity in mGal.</source>
      <translation>Die bekannte Schwere {} liegt außerhalb 970000-990000 mGal: sie muss die absolute Schwere in mGal sein.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="230" />
      <source>Largest loop misclosure (mGal)</source>
      <translation>Größter Schleifenschlussfehler (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="206" />
      <source>Leave readings beyond 3 standard errors out of a second pass</source>
      <translation>Ablesungen über 3 Standardfehlern in einem zweiten Durchgang auslassen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="195" />
      <source>Linear between base readings</source>
      <translation>Linear zwischen Basisablesungen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="181" />
      <source>Longman (1959)</source>
      <translation>Longman (1959)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="161" />
      <source>Loop field (empty: one loop per local calendar day)</source>
      <translation>Schleifenfeld (leer: eine Schleife je örtlichem Kalendertag)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="457" />
      <source>Loop, base, base readings, hours, misclosure (mGal), drift (mGal/h):</source>
      <translation>Schleife, Basis, Basisablesungen, Stunden, Schlussfehler (mGal), Drift (mGal/h):</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="229" />
      <source>Loops</source>
      <translation>Schleifen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="202" />
      <source>Measured vertical gradient field (mGal/m, empty: 0.3086)</source>
      <translation>Feld des gemessenen Vertikalgradienten (mGal/m, leer: 0,3086)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="132" />
      <source>Meter readings (table)</source>
      <translation>Gravimeterablesungen (Tabelle)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="194" />
      <source>Network adjustment (least squares)</source>
      <translation>Netzausgleichung (kleinste Quadrate)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="451" />
      <source>No reading is of a station of known gravity (or of a station tied to one): the network cannot be tied. Give the known gravity of at least one base station read in the loops.</source>
      <translation>Keine Ablesung gehört zu einer Station bekannter Schwere (oder einer daran angeschlossenen Station): das Netz kann nicht angeschlossen werden. Geben Sie die bekannte Schwere mindestens einer in den Schleifen abgelesenen Basisstation an.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="393" />
      <source>No station has a known gravity in the field {}: at least one base of known gravity is needed.</source>
      <translation>Keine Station hat eine bekannte Schwere im Feld {}: mindestens eine Basis bekannter Schwere wird benötigt.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="196" />
      <source>None</source>
      <translation>Keine</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="182" />
      <source>None (readings already corrected)</source>
      <translation>Keine (Ablesungen bereits korrigiert)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="93" />
      <source>Observed gravity from meter readings (tide, drift, base ties)</source>
      <translation>Gemessene Schwere aus Gravimeterablesungen (Gezeiten, Drift, Basisanschlüsse)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="137" />
      <source>Reading field</source>
      <translation>Feld der Ablesung</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="145" />
      <source>Reading units</source>
      <translation>Einheit der Ablesungen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="227" />
      <source>Reduced readings</source>
      <translation>Reduzierte Ablesungen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="153" />
      <source>Scale factor (mGal per unit, or a correction to the table)</source>
      <translation>Maßstabsfaktor (mGal je Einheit oder eine Korrektur der Tabelle)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="171" />
      <source>Station height field (m, for the tide)</source>
      <translation>Feld der Stationshöhe (m, für die Gezeiten)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="168" />
      <source>Station id field</source>
      <translation>Feld der Stationskennung</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="135" />
      <source>Station id field of the readings</source>
      <translation>Feld der Stationskennung in den Ablesungen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="224" />
      <source>Stations with observed gravity</source>
      <translation>Stationen mit gemessener Schwere</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="183" />
      <source>Sun and Moon from Meeus (1998) series, exact attraction</source>
      <translation>Sonne und Mond aus der Reihe von Meeus (1998), exakte Anziehung</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="238" />
      <source>The scale factor must be positive; got {}.</source>
      <translation>Der Maßstabsfaktor muss positiv sein; erhalten: {}.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="385" />
      <source>The station id '{}' appears more than once in the station layer; ids must be unique.</source>
      <translation>Die Stationskennung '{}' kommt im Stationslayer mehrfach vor; Kennungen müssen eindeutig sein.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="136" />
      <source>Time field (ISO 8601 text or date-time)</source>
      <translation>Zeitfeld (ISO-8601-Text oder Datum/Zeit)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="102" />
      <source>Turns gravimeter readings into observed gravity at each station, with loop checks.</source>
      <translation>Wandelt Gravimeterablesungen in die gemessene Schwere an jeder Station um, mit Schleifenkontrollen.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="141" />
      <source>UTC offset of times without one (hours, east positive)</source>
      <translation>UTC-Versatz von Zeiten ohne Angabe (Stunden, Osten positiv)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="105" />
      <source>gravity,gravimeter,readings,earth tide,Longman,drift,loop,base station,tie,calibration</source>
      <translation>Schwere,Gravimeter,Ablesungen,Erdgezeiten,Longman,Drift,Schleife,Basisstation,Anschluss,Kalibrierung</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="146" />
      <source>mGal</source>
      <translation>mGal</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="434" />
      <source>{} must be a positive standard error in mGal, got {}.</source>
      <translation>{} muss eine positive Standardabweichung in mGal sein, erhalten: {}.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="282" />
      <source>{} reading(s) name stations not in the station layer (e.g. {}); they are left out.</source>
      <translation>{} Ablesung(en) nennen Stationen, die nicht im Stationslayer sind (z. B. {}); sie werden ausgelassen.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/observed_gravity.py" line="362" />
      <source>{} readings in {} loops; {} stations with observed gravity; {} readings flagged; s0 = {:.4f} mGal.</source>
      <translation>{} Ablesungen in {} Schleifen; {} Stationen mit gemessener Schwere; {} Ablesungen markiert; s0 = {:.4f} mGal.</translation>
    </message>
  </context>
  <context>
    <name>QualityFlags</name>
    <message>
      <location filename="../plugin/flags.py" line="72" />
      <source>A station of known gravity (a tie of the network).</source>
      <translation>Eine Station bekannter Schwere (ein Anschlusspunkt des Netzes).</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="32" />
      <source>Density missing for this station: the default density was used.</source>
      <translation>Dichte für diese Station fehlt: die Standarddichte wurde verwendet.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="33" />
      <source>Density outside 1000-3500 kg/m3: check its units.</source>
      <translation>Dichte außerhalb 1000-3500 kg/m3: prüfen Sie die Einheit.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="40" />
      <source>Density outside 500-5000 kg/m3: no Bouguer anomaly computed for this station.</source>
      <translation>Dichte außerhalb 500-5000 kg/m3: für diese Station wurde keine Bouguer-Anomalie berechnet.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="30" />
      <source>Latitude out of range: the position cannot be located on Earth.</source>
      <translation>Breite außerhalb des gültigen Bereichs: die Position lässt sich nicht auf der Erde verorten.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="77" />
      <source>No fine elevation data at the station: its terrain correction comes from the regional raster alone.</source>
      <translation>Keine feinen Höhendaten an der Station: ihre Geländekorrektion stammt allein aus dem regionalen Raster.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="44" />
      <source>No geoid height at the station: its heights cannot be converted between datums.</source>
      <translation>Keine Geoidhöhe an der Station: ihre Höhen können nicht zwischen Höhenbezugssystemen umgerechnet werden.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="63" />
      <source>No instrument height given for this reading: 0 m used.</source>
      <translation>Keine Instrumentenhöhe für diese Ablesung angegeben: 0 m verwendet.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="27" />
      <source>No observed gravity: no anomaly computed.</source>
      <translation>Keine gemessene Schwere: keine Anomalie berechnet.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="28" />
      <source>No station height: no anomaly computed.</source>
      <translation>Keine Stationshöhe: keine Anomalie berechnet.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="45" />
      <source>No terrain correction for this station: no complete Bouguer anomaly.</source>
      <translation>Keine Geländekorrektion für diese Station: keine vollständige Bouguer-Anomalie.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="70" />
      <source>No usable reading of this station: no observed gravity.</source>
      <translation>Keine verwendbare Ablesung dieser Station: keine gemessene Schwere.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="69" />
      <source>Not connected through any loop to a station of known gravity.</source>
      <translation>Über keine Schleife mit einer Station bekannter Schwere verbunden.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="37" />
      <source>Observed gravity outside Earth's range (975000-984000 mGal) after units: no anomaly computed.</source>
      <translation>Gemessene Schwere außerhalb des Bereichs der Erde (975000-984000 mGal) nach Einheitenumrechnung: keine Anomalie berechnet.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="71" />
      <source>One reading only: no check on this station's value.</source>
      <translation>Nur eine Ablesung: keine Kontrolle des Wertes dieser Station.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="53" />
      <source>Ring-and-sector: no elevation data at the station, so the zones finer than a DEM cell count as flat.</source>
      <translation>Ringe und Sektoren: keine Höhendaten an der Station, daher gelten die Zonen, die feiner als eine DGM-Zelle sind, als eben.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="61" />
      <source>Same station and time as an earlier row: this copy is left out.</source>
      <translation>Gleiche Station und Zeit wie eine frühere Zeile: diese Kopie wird ausgelassen.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="49" />
      <source>Some ring-and-sector compartments had no elevation data and count as flat.</source>
      <translation>Einige Kompartimente der Ringe und Sektoren hatten keine Höhendaten und gelten als eben.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="41" />
      <source>Station height disagrees with the DEM by more than the local relief explains (see dem_diff).</source>
      <translation>Die Stationshöhe weicht stärker vom DGM ab, als das örtliche Relief erklärt (siehe dem_diff).</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="29" />
      <source>Station height taken from the DEM (the layer gave none).</source>
      <translation>Stationshöhe aus dem DGM entnommen (der Layer enthielt keine).</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="47" />
      <source>The elevation raster has no data at the station: no terrain correction.</source>
      <translation>Das Höhenraster hat an der Station keine Daten: keine Geländekorrektion.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="48" />
      <source>The elevation rasters do not cover the whole correction area (see tc_cover).</source>
      <translation>Die Höhenraster decken nicht das ganze Korrektionsgebiet ab (siehe tc_cover).</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="73" />
      <source>The elevation rasters lack data over part of the inner zone (see the inner coverage).</source>
      <translation>Den Höhenrastern fehlen Daten in einem Teil der Innenzone (siehe die innere Abdeckung).</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="50" />
      <source>The fine elevation raster has no data near the station: the regional raster filled those cells.</source>
      <translation>Das feine Höhenraster hat nahe der Station keine Daten: das regionale Raster hat diese Zellen gefüllt.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="67" />
      <source>The loop occupies its base once only: no closure, drift not from the base.</source>
      <translation>Die Schleife besetzt ihre Basis nur einmal: kein Schleifenschluss, Drift nicht aus der Basis.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="68" />
      <source>The loop's drift could not be determined from its readings: none applied.</source>
      <translation>Die Drift der Schleife konnte aus ihren Ablesungen nicht bestimmt werden: keine angebracht.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="31" />
      <source>The position could not be transformed to latitude and longitude.</source>
      <translation>Die Position konnte nicht in geographische Breite und Länge transformiert werden.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="60" />
      <source>The reading is empty or not a number: left out.</source>
      <translation>Die Ablesung ist leer oder keine Zahl: ausgelassen.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="59" />
      <source>The reading names a station that is not in the station layer: left out.</source>
      <translation>Die Ablesung nennt eine Station, die nicht im Stationslayer ist: ausgelassen.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="66" />
      <source>The reading was left out of the final adjustment (outlier second pass).</source>
      <translation>Die Ablesung wurde in der abschließenden Ausgleichung ausgelassen (Ausreißer, zweiter Durchgang).</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="65" />
      <source>The reading's residual exceeds 3 standard errors.</source>
      <translation>Das Residuum der Ablesung übersteigt 3 Standardfehler.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="26" />
      <source>The station has no point geometry.</source>
      <translation>Die Station hat keine Punktgeometrie.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="64" />
      <source>The station has no usable position for the tide: its readings are left out.</source>
      <translation>Die Station hat keine verwendbare Position für die Gezeiten: ihre Ablesungen werden ausgelassen.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="34" />
      <source>The station is a multi-part point whose parts lie apart: its position is ambiguous.</source>
      <translation>Die Station ist ein Multipunkt, dessen Teile auseinanderliegen: ihre Position ist mehrdeutig.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="56" />
      <source>The station lies outside the anomaly raster or next to blank cells: no regional or residual value.</source>
      <translation>Die Station liegt außerhalb des Anomalierasters oder neben leeren Zellen: kein Regional- oder Residualwert.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="46" />
      <source>The station lies outside the elevation raster: no terrain correction.</source>
      <translation>Die Station liegt außerhalb des Höhenrasters: keine Geländekorrektion.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="62" />
      <source>The time is earlier than a previous row of the same loop: check it.</source>
      <translation>Die Zeit liegt vor einer vorherigen Zeile derselben Schleife: bitte prüfen.</translation>
    </message>
    <message>
      <location filename="../plugin/flags.py" line="74" />
      <source>With water, the terrain correction uses the reference (median) density, not this station's.</source>
      <translation>Mit Wasser verwendet die Geländekorrektion die Bezugsdichte (Median), nicht die dieser Station.</translation>
    </message>
  </context>
  <context>
    <name>ReadingsTable</name>
    <message>
      <location filename="../plugin/readings_table.py" line="112" />
      <source> and {} more</source>
      <translation> und {} weitere</translation>
    </message>
    <message>
      <location filename="../plugin/readings_table.py" line="64" />
      <source>Cancelled by the user.</source>
      <translation>Vom Benutzer abgebrochen.</translation>
    </message>
    <message>
      <location filename="../plugin/readings_table.py" line="148" />
      <source>Row {} of the calibration table has no number in its field {}.</source>
      <translation>Zeile {} der Kalibriertabelle hat keine Zahl in ihrem Feld {}.</translation>
    </message>
    <message>
      <location filename="../plugin/readings_table.py" line="154" />
      <source>The calibration table cannot be used: {}.</source>
      <translation>Die Kalibriertabelle kann nicht verwendet werden: {}.</translation>
    </message>
    <message>
      <location filename="../plugin/readings_table.py" line="137" />
      <source>The calibration table needs the fields counter, mgal and factor; it has {}.</source>
      <translation>Die Kalibriertabelle braucht die Felder counter, mgal und factor; sie hat {}.</translation>
    </message>
    <message>
      <location filename="../plugin/readings_table.py" line="109" />
      <source>The readings table has no rows: there is nothing to process.</source>
      <translation>Die Tabelle der Ablesungen hat keine Zeilen: es gibt nichts zu verarbeiten.</translation>
    </message>
    <message>
      <location filename="../plugin/readings_table.py" line="114" />
      <source>The time of row(s) {}{} of the readings cannot be read. Accepted forms: {}, or a date-time field.</source>
      <translation>Die Zeit der Zeile(n) {}{} der Ablesungen kann nicht gelesen werden. Zulässige Formen: {} oder ein Datum/Zeit-Feld.</translation>
    </message>
  </context>
  <context>
    <name>RegionalResidualAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="83" />
      <source>&lt;p&gt;Splits an anomaly raster (mGal, projected CRS in metres) into a &lt;b&gt;regional&lt;/b&gt; raster and a &lt;b&gt;residual&lt;/b&gt; raster = input - regional.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Polynomial trend surface&lt;/b&gt;: a polynomial of order 1 (plane), 2 or 3 in the coordinates, fitted to every cell with a value by least squares; the robust fit reweights the cells iteratively (Huber or Tukey biweight; Holland &amp;amp; Welsch 1977) so that local anomalies do not pull the regional.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Upward continuation&lt;/b&gt;: the anomaly continued upward by &lt;b&gt;Height&lt;/b&gt; metres with the Fourier filter exp(-|k| h) (Blakely 1995). Blank cells are filled with the nearest value, the best-fitting plane is removed, and the grid is extended by mirror images (by &lt;b&gt;Padding&lt;/b&gt; times its size on each side) faded to zero by a cosine taper before the transform; blank cells stay blank.&lt;/p&gt;&lt;p&gt;Optional: sample both rasters (bilinear) at a station layer, written as a copy with the fields &lt;b&gt;regional&lt;/b&gt; and &lt;b&gt;residual&lt;/b&gt; (mGal); stations off the raster get empty values and the code outside_grid in qc_flag.&lt;/p&gt;&lt;p&gt;The choice of regional is an interpretation: state the method and its parameters with any residual map you hand on.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</source>
      <translation>&lt;p&gt;Zerlegt ein Anomalieraster (mGal, projiziertes KBS in Metern) in ein &lt;b&gt;Regionalraster&lt;/b&gt; und ein &lt;b&gt;Residualraster&lt;/b&gt; = Eingabe - Regionalfeld.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Polynomiale Trendfläche&lt;/b&gt;: ein Polynom der Ordnung 1 (Ebene), 2 oder 3 in den Koordinaten, nach kleinsten Quadraten an jede Zelle mit Wert angepasst; die robuste Anpassung gewichtet die Zellen iterativ neu (Huber oder Tukey-Biweight; Holland &amp;amp; Welsch 1977), damit örtliche Anomalien das Regionalfeld nicht verziehen.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Feldfortsetzung nach oben&lt;/b&gt;: die Anomalie, um &lt;b&gt;Höhe&lt;/b&gt; Meter nach oben fortgesetzt, mit dem Fourier-Filter exp(-|k| h) (Blakely 1995). Leere Zellen werden mit dem nächstgelegenen Wert gefüllt, die bestangepasste Ebene wird abgezogen, und das Gitter wird vor der Transformation durch Spiegelbilder erweitert (um das &lt;b&gt;Randerweiterung&lt;/b&gt;-Fache seiner Größe je Seite), die ein Kosinus-Taper auf null abklingen lässt; leere Zellen bleiben leer.&lt;/p&gt;&lt;p&gt;Optional: beide Raster (bilinear) an einem Stationslayer abtasten, als Kopie mit den Feldern &lt;b&gt;regional&lt;/b&gt; und &lt;b&gt;residual&lt;/b&gt; (mGal) geschrieben; Stationen außerhalb des Rasters erhalten leere Werte und den Code outside_grid in qc_flag.&lt;/p&gt;&lt;p&gt;Die Wahl des Regionalfelds ist eine Interpretation: nennen Sie Verfahren und Parameter bei jeder Residualkarte, die Sie weitergeben.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="104" />
      <source>Anomaly raster (mGal)</source>
      <translation>Anomalieraster (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="229" />
      <location filename="../plugin/toolbox/regional_residual.py" line="308" />
      <source>Cancelled by the user.</source>
      <translation>Vom Benutzer abgebrochen.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="164" />
      <source>Choose the stations to sample, or leave the station output empty.</source>
      <translation>Wählen Sie die abzutastenden Stationen oder lassen Sie die Stationsausgabe leer.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="129" />
      <source>Continuation height (m)</source>
      <translation>Fortsetzungshöhe (m)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="320" />
      <source>Could not write a station to the output layer.</source>
      <translation>Eine Station konnte nicht in den Ausgabelayer geschrieben werden.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="123" />
      <source>Least squares</source>
      <translation>Kleinste Quadrate</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="74" />
      <source>Maps</source>
      <translation>Karten</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="134" />
      <source>Padding on each side (fraction of the grid size)</source>
      <translation>Randerweiterung je Seite (Anteil der Rastergröße)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="109" />
      <source>Polynomial trend surface</source>
      <translation>Polynomiale Trendfläche</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="251" />
      <source>Regional</source>
      <translation>Regional</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="68" />
      <source>Regional and residual anomaly (trend surface or upward continuation)</source>
      <translation>Regional- und Residualanomalie (Trendfläche oder Feldfortsetzung nach oben)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="144" />
      <source>Regional anomaly</source>
      <translation>Regionalanomalie</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="273" />
      <source>Regional by {}: {} cells; residual from {:.3f} to {:.3f} mGal (rms {:.3f}).</source>
      <translation>Regionalfeld durch {}: {} Zellen; Residuum von {:.3f} bis {:.3f} mGal (RMS {:.3f}).</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="108" />
      <source>Regional from</source>
      <translation>Regionalfeld aus</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="252" />
      <source>Residual</source>
      <translation>Residual</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="145" />
      <source>Residual anomaly</source>
      <translation>Residualanomalie</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="123" />
      <source>Robust, Huber weights</source>
      <translation>Robust, Huber-Gewichte</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="123" />
      <source>Robust, Tukey biweight</source>
      <translation>Robust, Tukey-Biweight</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="77" />
      <source>Splits an anomaly raster into a regional and a residual raster.</source>
      <translation>Zerlegt ein Anomalieraster in ein Regional- und ein Residualraster.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="152" />
      <source>Stations sampled</source>
      <translation>Abgetastete Stationen (Anzahl)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="141" />
      <source>Stations to sample (optional)</source>
      <translation>Abzutastende Stationen (optional)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="148" />
      <source>Stations with regional and residual</source>
      <translation>Stationen mit Regional- und Residualwert</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="205" />
      <source>The anomaly raster has no cell with a value.</source>
      <translation>Das Anomalieraster hat keine Zelle mit einem Wert.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="174" />
      <source>The anomaly raster has no coordinate reference system.</source>
      <translation>Das Anomalieraster hat kein Koordinatenbezugssystem.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="177" />
      <source>The anomaly raster is in a geographic CRS ({}), in degrees; both methods need cells in metres. Warp it to a projected CRS first.</source>
      <translation>Das Anomalieraster liegt in einem geographischen KBS ({}) in Grad vor; beide Verfahren brauchen Zellen in Metern. Transformieren Sie es zuerst in ein projiziertes KBS.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="184" />
      <source>The anomaly raster is rotated; warp it to a north-up grid first.</source>
      <translation>Das Anomalieraster ist gedreht; transformieren Sie es zuerst in ein nordorientiertes Gitter.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="160" />
      <source>The continuation height must be more than 0 m (upward).</source>
      <translation>Die Fortsetzungshöhe muss größer als 0 m sein (nach oben).</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="227" />
      <source>The raster cannot be separated: {}</source>
      <translation>Das Raster kann nicht zerlegt werden: {}</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="170" />
      <source>The raster {} is not a GDAL raster; save it as a GeoTIFF first.</source>
      <translation>Das Raster {} ist kein GDAL-Raster; speichern Sie es zuerst als GeoTIFF.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="295" />
      <source>The stations already have a field {}; its values are replaced in the output copy.</source>
      <translation>Die Stationen haben bereits ein Feld {}; seine Werte werden in der Ausgabekopie ersetzt.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="222" />
      <source>Trend coefficients per metre about ({:.1f}, {:.1f}): {}.</source>
      <translation>Trendkoeffizienten je Meter um ({:.1f}, {:.1f}): {}.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="122" />
      <source>Trend surface fit</source>
      <translation>Anpassung der Trendfläche</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="115" />
      <source>Trend surface order (1-3)</source>
      <translation>Ordnung der Trendfläche (1-3)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="109" />
      <source>Upward continuation (FFT)</source>
      <translation>Feldfortsetzung nach oben (FFT)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="80" />
      <source>gravity,anomaly,regional,residual,trend surface,polynomial,upward continuation,FFT</source>
      <translation>Schwere,Anomalie,Regionalfeld,Residualfeld,Trendfläche,Polynom,Feldfortsetzung nach oben,FFT</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="218" />
      <source>least squares</source>
      <translation>kleinste Quadrate</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="219" />
      <source>trend surface of order {} ({})</source>
      <translation>Trendfläche der Ordnung {} ({})</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="213" />
      <source>upward continuation by {:g} m</source>
      <translation>Feldfortsetzung nach oben um {:g} m</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="260" />
      <source>{} anomaly (mGal)</source>
      <translation>{}anomalie (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="324" />
      <source>{} of {} stations lie outside the raster or next to blank cells (qc_flag outside_grid).</source>
      <translation>{} von {} Stationen liegen außerhalb des Rasters oder neben leeren Zellen (qc_flag outside_grid).</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/regional_residual.py" line="261" />
      <source>{} part of {} by {}; values in mGal; regional + residual = input.</source>
      <translation>{}anteil von {} durch {}; Werte in mGal; Regionalfeld + Residualfeld = Eingabe.</translation>
    </message>
  </context>
  <context>
    <name>ReliefGravityAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/base.py" line="238" />
      <source>1967 formula (legacy databases)</source>
      <translation>Formel von 1967 (ältere Datenbanken)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="81" />
      <source>A density of {:g} kg/m³ ({}) is 1,000 times too large (g/cm³ values multiplied twice, or g/m³?): densities must lie between {:g} and {:g} kg/m³; enter {:g}.</source>
      <translation>Eine Dichte von {:g} kg/m³ ({}) ist 1.000-mal zu groß (g/cm³-Werte doppelt multipliziert oder g/m³?): Dichten müssen zwischen {:g} und {:g} kg/m³ liegen; geben Sie {:g} ein.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="85" />
      <source>A density of {:g} kg/m³ ({}) is outside the accepted range {:g}-{:g} kg/m³.</source>
      <translation>Eine Dichte von {:g} kg/m³ ({}) liegt außerhalb des zulässigen Bereichs {:g}-{:g} kg/m³.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="76" />
      <source>A density of {:g} kg/m³ ({}) looks like g/cm³: densities must lie between {:g} and {:g} kg/m³; enter {:g} for {:g} g/cm³.</source>
      <translation>Eine Dichte von {:g} kg/m³ ({}) sieht nach g/cm³ aus: Dichten müssen zwischen {:g} und {:g} kg/m³ liegen; geben Sie {:g} für {:g} g/cm³ ein.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="189" />
      <source>A geoid height field or raster is given but HEIGHT_DATUM does not use it: set HEIGHT_DATUM to 'orthometric, geoid height from GEOID_FIELD or GEOID_RASTER', or clear them.</source>
      <translation>Ein Feld oder Raster der Geoidhöhe ist angegeben, aber HEIGHT_DATUM verwendet es nicht: setzen Sie HEIGHT_DATUM auf 'orthometrisch, Geoidhöhe aus GEOID_FIELD oder GEOID_RASTER' oder leeren Sie beide.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="255" />
      <source>Apply the atmospheric correction</source>
      <translation>Atmosphärenkorrektion anbringen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="397" />
      <source>Cancelled by the user.</source>
      <translation>Vom Benutzer abgebrochen.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="135" />
      <source>Centimetres</source>
      <translation>Zentimeter</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="171" />
      <source>Elevation raster heights are above</source>
      <translation>Höhen des Höhenrasters beziehen sich auf</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="271" />
      <source>Estimate the engine's own error against a refined evaluation (tc_numerr; about 4x the time)</source>
      <translation>Eigenen Rechenfehler des Verfahrens gegen eine verfeinerte Auswertung schätzen (tc_numerr; etwa vierfache Rechenzeit)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="135" />
      <source>Feet</source>
      <translation>Fuß</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="249" />
      <source>First order, 0.3086 mGal/m</source>
      <translation>Erster Ordnung, 0,3086 mGal/m</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="236" />
      <source>GRS80 (Somigliana closed form)</source>
      <translation>GRS80 (geschlossene Formel nach Somigliana)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="158" />
      <source>Geoid height field (m, geoid above the ellipsoid)</source>
      <translation>Feld der Geoidhöhe (m, Geoid über dem Ellipsoid)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="166" />
      <source>Geoid height raster (m, geoid above the ellipsoid)</source>
      <translation>Raster der Geoidhöhe (m, Geoid über dem Ellipsoid)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="47" />
      <source>Gravity reduction</source>
      <translation>Schwerereduktion</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="125" />
      <source>Gravity stations</source>
      <translation>Schwerestationen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="184" />
      <source>HEIGHT_DATUM says the geoid height comes from a field or a raster: choose exactly one of GEOID_FIELD and GEOID_RASTER.</source>
      <translation>HEIGHT_DATUM besagt, dass die Geoidhöhe aus einem Feld oder Raster stammt: wählen Sie genau eines von GEOID_FIELD und GEOID_RASTER.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="246" />
      <source>Height (free-air) correction</source>
      <translation>Höhenkorrektion (Freiluft)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="134" />
      <source>Height units</source>
      <translation>Höheneinheit</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="292" />
      <source>Inner zone radius (m)</source>
      <translation>Radius der Innenzone (m)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="135" />
      <source>Metres</source>
      <translation>Meter</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="234" />
      <source>Normal gravity</source>
      <translation>Normalschwere</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="293" />
      <source>Outer zone radius (m)</source>
      <translation>Radius der Außenzone (m)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="441" />
      <source>Provenance is recorded in GeoPackage and GeoTIFF outputs only; this output has none.</source>
      <translation>Herkunftsangaben werden nur in GeoPackage- und GeoTIFF-Ausgaben aufgezeichnet; diese Ausgabe hat keine.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="221" />
      <source>Reduction density (kg/m³)</source>
      <translation>Reduktionsdichte (kg/m³)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="288" />
      <source>Regional elevation raster for the outer zone</source>
      <translation>Regionales Höhenraster für die Außenzone</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="18" />
      <source>Results support interpretation only. Check every reduction against the survey's own ties and specifications; decisions on drilling, groundwater or engineering, and reporting under a jurisdiction's rules, are for licensed practice and local codes.</source>
      <translation>Die Ergebnisse dienen nur der Interpretation. Prüfen Sie jede Reduktion an den Anschlussmessungen und Vorgaben der Vermessung; Entscheidungen über Bohrungen, Grundwasser oder Bauvorhaben sowie Berichte nach den Regeln einer Rechtsordnung sind Sache zugelassener Fachleute und örtlicher Vorschriften.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="248" />
      <source>Second order, latitude dependent (Hinze et al. 2005)</source>
      <translation>Zweiter Ordnung, breitenabhängig (Hinze et al. 2005)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="260" />
      <source>Spherical cap to 166.7 km (add the curvature correction to the slab)</source>
      <translation>Kugelkappe bis 166,7 km (Krümmungskorrektion zur Platte)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="152" />
      <source>Station heights are</source>
      <translation>Höhenbezug der Stationshöhen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="315" />
      <source>The inner zone radius ({} m) must be positive and smaller than the outer zone radius ({} m).</source>
      <translation>Der Radius der Innenzone ({} m) muss positiv und kleiner als der Radius der Außenzone ({} m) sein.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="358" />
      <source>The input already has a field {}; its values are replaced in the output copy.</source>
      <translation>Die Eingabe hat bereits ein Feld {}; seine Werte werden in der Ausgabekopie ersetzt.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="449" />
      <source>The provenance record could not be written: {}</source>
      <translation>Die Herkunftsangaben konnten nicht geschrieben werden: {}</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="237" />
      <source>WGS84 (Somigliana closed form)</source>
      <translation>WGS84 (geschlossene Formel nach Somigliana)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="375" />
      <source>elevation raster</source>
      <translation>Höhenraster</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="377" />
      <source>geoid raster</source>
      <translation>Geoidraster</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="380" />
      <source>output station layer</source>
      <translation>Ausgabe-Stationslayer</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="376" />
      <source>regional elevation raster</source>
      <translation>regionales Höhenraster</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="373" />
      <source>station layer</source>
      <translation>Stationslayer</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="204" />
      <source>the field {}</source>
      <translation>Feld {}</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="212" />
      <source>the raster {}</source>
      <translation>Raster {}</translation>
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
      <translation>Im Ordner {} ({}) kann nicht geschrieben werden: {}</translation>
    </message>
    <message>
      <location filename="../plugin/outputs.py" line="140" />
      <source>Could not move the finished output into place at {}: {}</source>
      <translation>Die fertige Ausgabe konnte nicht nach {} verschoben werden: {}</translation>
    </message>
    <message>
      <location filename="../plugin/outputs.py" line="99" />
      <source>The folder {} of the {} does not exist; create it or choose another.</source>
      <translation>Der Ordner {} ({}) existiert nicht; legen Sie ihn an oder wählen Sie einen anderen.</translation>
    </message>
    <message>
      <location filename="../plugin/outputs.py" line="103" />
      <source>The folder {} of the {} is not writable; choose a folder you may write to.</source>
      <translation>Der Ordner {} ({}) ist nicht beschreibbar; wählen Sie einen Ordner, in den Sie schreiben dürfen.</translation>
    </message>
    <message>
      <location filename="../plugin/outputs.py" line="68" />
      <source>The {} and the {} are both set to {}; choose two different files.</source>
      <translation>„{}“ und „{}“ sind beide auf {} gesetzt; wählen Sie zwei verschiedene Dateien.</translation>
    </message>
    <message>
      <location filename="../plugin/outputs.py" line="59" />
      <source>The {} would be written to {}, which is the {}: writing it would destroy that input. Choose another file name.</source>
      <translation>„{}“ würde nach {} geschrieben, in die Datei der Eingabe „{}“: das Schreiben würde diese Eingabe zerstören. Wählen Sie einen anderen Dateinamen.</translation>
    </message>
  </context>
  <context>
    <name>ShippedModel</name>
    <message>
      <location filename="../plugin/shipped_models.py" line="84" />
      <source>Model {} skipped: an algorithm named {} exists already.</source>
      <translation>Modell {} übersprungen: ein Algorithmus namens {} existiert bereits.</translation>
    </message>
    <message>
      <location filename="../plugin/shipped_models.py" line="96" />
      <source>Model {} skipped: it needs {}, which is not installed.</source>
      <translation>Modell {} übersprungen: es braucht {}, das nicht installiert ist.</translation>
    </message>
    <message>
      <location filename="../plugin/shipped_models.py" line="80" />
      <source>Model {} skipped: its file name must be lower-case letters, digits and underscores to serve as an algorithm name.</source>
      <translation>Modell {} übersprungen: sein Dateiname darf nur Kleinbuchstaben, Ziffern und Unterstriche enthalten, um als Algorithmusname zu dienen.</translation>
    </message>
    <message>
      <location filename="../plugin/shipped_models.py" line="90" />
      <source>Model {} skipped: the file could not be read as a Processing model.</source>
      <translation>Modell {} übersprungen: die Datei konnte nicht als Processing-Modell gelesen werden.</translation>
    </message>
    <message>
      <location filename="../plugin/shipped_models.py" line="58" />
      <source>Models</source>
      <translation>Modelle</translation>
    </message>
  </context>
  <context>
    <name>StationAreas</name>
    <message>
      <location filename="../plugin/station_areas.py" line="66" />
      <source>A polygon of {} cannot be reprojected to the stations' CRS: {}</source>
      <translation>Ein Polygon von {} lässt sich nicht in das KBS der Stationen umprojizieren: {}</translation>
    </message>
    <message>
      <location filename="../plugin/station_areas.py" line="55" />
      <source>{} has no coordinate reference system.</source>
      <translation>{} hat kein Koordinatenbezugssystem.</translation>
    </message>
    <message>
      <location filename="../plugin/station_areas.py" line="72" />
      <source>{} has no polygon.</source>
      <translation>{} enthält kein Polygon.</translation>
    </message>
    <message>
      <location filename="../plugin/station_areas.py" line="53" />
      <source>{} must be a polygon layer.</source>
      <translation>{} muss ein Polygonlayer sein.</translation>
    </message>
  </context>
  <context>
    <name>StationHeights</name>
    <message>
      <location filename="../plugin/heights.py" line="55" />
      <source>EGM96 geoid (most global DEMs)</source>
      <translation>EGM96-Geoid (die meisten globalen DGM)</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="56" />
      <source>Ellipsoid</source>
      <translation>Ellipsoid</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="40" />
      <source>Ellipsoidal heights (e.g. from GNSS)</source>
      <translation>Ellipsoidische Höhen (z. B. aus GNSS)</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="287" />
      <source>Give a regional elevation raster (REGIONAL_DEM) reaching {:.1f} km around every station.</source>
      <translation>Geben Sie ein regionales Höhenraster (REGIONAL_DEM) an, das {:.1f} km um jede Station reicht.</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="41" />
      <source>Orthometric heights above the EGM96 geoid</source>
      <translation>Orthometrische Höhen über dem EGM96-Geoid</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="42" />
      <source>Orthometric heights, geoid height from GEOID_FIELD or GEOID_RASTER</source>
      <translation>Orthometrische Höhen, Geoidhöhe aus GEOID_FIELD oder GEOID_RASTER</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="57" />
      <source>Same as the station heights</source>
      <translation>Wie die Stationshöhen</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="143" />
      <source>The elevation raster looks like heights in {} (about {:.4g} times the station heights in metres: DEM median {:.1f} against {:.1f} m). Convert it to metres (Raster Calculator: value × {}) and run again.</source>
      <translation>Das Höhenraster scheint Höhen in {} zu enthalten (etwa das {:.4g}-Fache der Stationshöhen in Metern: DGM-Median {:.1f} gegenüber {:.1f} m). Rechnen Sie es in Meter um (Rasterrechner: Wert × {}) und starten Sie erneut.</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="289" />
      <source>The regional elevation raster does not reach {:.1f} km around these stations; extend it.</source>
      <translation>Das regionale Höhenraster reicht nicht {:.1f} km um diese Stationen; erweitern Sie es.</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="137" />
      <source>The station heights look like metres declared in another unit (median {:.1f} m after conversion against a DEM median of {:.1f} m): set HEIGHT_UNITS to metres.</source>
      <translation>Die Stationshöhen sehen aus wie Meter, die in einer anderen Einheit angegeben wurden (Median {:.1f} m nach Umrechnung gegenüber einem DGM-Median von {:.1f} m): setzen Sie HEIGHT_UNITS auf Meter.</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="131" />
      <source>The station heights look like {} read as metres (median {:.1f} against a DEM median of {:.1f} m at the stations): set HEIGHT_UNITS to {}.</source>
      <translation>Die Stationshöhen sehen aus wie als Meter gelesene {} (Median {:.1f} gegenüber einem DGM-Median von {:.1f} m an den Stationen): setzen Sie HEIGHT_UNITS auf {}.</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="164" />
      <source>The {} {} cannot be read to the end (damaged or truncated file?): {}</source>
      <translation>{} {} kann nicht bis zum Ende gelesen werden (beschädigte oder abgeschnittene Datei?): {}</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="181" />
      <source>The {} {} goes down to {:.6g}, deeper than any point on Earth in metres: an untagged void value or a unit error. Set its NoData value or convert it to metres.</source>
      <translation>{} {} reicht hinab bis {:.6g}, tiefer als jeder Punkt der Erde in Metern: ein nicht gekennzeichneter Leerwert oder ein Einheitenfehler. Setzen Sie seinen NoData-Wert oder rechnen Sie es in Meter um.</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="170" />
      <source>The {} {} has cells of {:.6g} but no NoData value: they look like voids and would be taken as heights. Set the raster's NoData value to {:.6g} (Raster &gt; Conversion &gt; Translate, 'Assign a specified NoData value') and run again.</source>
      <translation>{} {} hat Zellen mit {:.6g}, aber keinen NoData-Wert: sie sehen wie Lücken aus und würden als Höhen genommen. Setzen Sie den NoData-Wert des Rasters auf {:.6g} (Raster &gt; Konvertierung &gt; Übersetzen, 'Einen bestimmten NoData-Wert zuweisen') und starten Sie erneut.</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="161" />
      <source>The {} {} holds no valid heights (every cell is NoData).</source>
      <translation>{} {} enthält keine gültigen Höhen (jede Zelle ist NoData).</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="176" />
      <source>The {} {} reaches {:.6g}, higher than any point on Earth in metres: it looks like feet or centimetres. Convert it to metres and run again.</source>
      <translation>{} {} erreicht {:.6g}, höher als jeder Punkt der Erde in Metern: es sieht nach Fuß oder Zentimetern aus. Rechnen Sie es in Meter um und starten Sie erneut.</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="246" />
      <source>above</source>
      <translation>über</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="246" />
      <source>below</source>
      <translation>unter</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="130" />
      <location filename="../plugin/heights.py" line="141" />
      <source>centimetres</source>
      <translation>Zentimeter</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="130" />
      <location filename="../plugin/heights.py" line="141" />
      <source>feet</source>
      <translation>Fuß</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="248" />
      <source>{:.0%} of the stations lie about one geoid height ({:.1f} m) {} the DEM: a datum setting is likely wrong. Try {} = '{}'. (Either the station heights or the DEM are on another datum than declared; see docs/datums.md.)</source>
      <translation>{:.0%} der Stationen liegen etwa eine Geoidhöhe ({:.1f} m) {} dem DGM: wahrscheinlich ist ein Höhenbezug falsch eingestellt. Versuchen Sie {} = '{}'. (Entweder die Stationshöhen oder das DGM beziehen sich auf ein anderes Höhenbezugssystem als angegeben; siehe docs/datums.md.)</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="233" />
      <source>{} station(s) differ from the DEM by more than the local relief explains (largest {:.1f} m; flagged height_dem_mismatch, see dem_diff).</source>
      <translation>{} Station(en) weichen stärker vom DGM ab, als das örtliche Relief erklärt (größte Abweichung {:.1f} m; markiert mit height_dem_mismatch, siehe dem_diff).</translation>
    </message>
    <message>
      <location filename="../plugin/heights.py" line="292" />
      <source>{} station(s) have elevation data over only part of the correction area (lowest tc_cover {:.2f}); their terrain correction misses the far terrain (flagged tc_partial). {}</source>
      <translation>{} Station(en) haben Höhendaten nur über einen Teil des Korrektionsgebiets (kleinstes tc_cover {:.2f}); ihrer Geländekorrektion fehlt das ferne Gelände (markiert mit tc_partial). {}</translation>
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
      <translation>Station {} hat Koordinaten ({:.6g}, {:.6g}), die nach geographischer Länge und Breite aussehen, aber der Layer ist in {} (Einheit Meter) angegeben. Weisen Sie dem Layer sein tatsächliches KBS zu (zum Beispiel EPSG:4326) unter Layereigenschaften &gt; Quelle, oder projizieren Sie ihn um.</translation>
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
      <translation>Der Stationslayer enthält {}-Geometrien; Stationen müssen Punkte sein. Wandeln Sie ihn zuerst um (zum Beispiel Vektor &gt; Geometriewerkzeuge &gt; Zentroide) oder wählen Sie den Punktlayer.</translation>
    </message>
    <message>
      <location filename="../plugin/stations.py" line="281" />
      <source>{} station(s) lie outside the area of use of the layer's CRS {} (first: station {} at {:.6g}, {:.6g}). Their latitudes would be wrong. Check the coordinates and assign the layer's true CRS (Layer Properties &gt; Source).</source>
      <translation>{} Station(en) liegen außerhalb des Anwendungsbereichs des Layer-KBS {} (erste: Station {} bei {:.6g}, {:.6g}). Ihre Breiten wären falsch. Prüfen Sie die Koordinaten und weisen Sie dem Layer sein tatsächliches KBS zu (Layereigenschaften &gt; Quelle).</translation>
    </message>
  </context>
  <context>
    <name>SurveyReport</name>
    <message>
      <location filename="../plugin/report/content.py" line="153" />
      <source>  worst flag: {}</source>
      <translation>  schwerstes Kennzeichen: {}</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="193" />
      <source>Anomalies against height</source>
      <translation>Anomalien gegen die Höhe</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="197" />
      <source>Anomalies against station height</source>
      <translation>Anomalien gegen die Stationshöhe</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="187" />
      <source>Anomaly distributions (mGal)</source>
      <translation>Verteilung der Anomalien (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="170" />
      <source>Anomaly map</source>
      <translation>Anomaliekarte</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="284" />
      <source>Caution.</source>
      <translation>Vorsicht.</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="299" />
      <source>Cautions</source>
      <translation>Vorsichtshinweise</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="47" />
      <source>Check every reduction against the survey's own ties, base stations and specifications.</source>
      <translation>Prüfen Sie jede Reduktion an den Anschlüssen, Basisstationen und Vorgaben der Vermessung selbst.</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="48" />
      <source>Decisions on drilling, groundwater abstraction or engineering works, and reporting under a jurisdiction's rules, are for licensed practice under local codes.</source>
      <translation>Entscheidungen über Bohrungen, Grundwasserentnahme oder Bauwerke sowie Berichte nach den Regeln einer Rechtsordnung gehören in die Hand zugelassener Fachleute nach den örtlichen Vorschriften.</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="262" />
      <source>Flagged stations</source>
      <translation>Gekennzeichnete Stationen</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="162" />
      <source>Flags by code</source>
      <translation>Kennzeichen nach Code</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="198" />
      <source>Free-air anomaly follows the terrain; a Bouguer anomaly should not (Nettleton 1939).</source>
      <translation>Die Freiluftanomalie folgt dem Gelände; eine Bouguer-Anomalie sollte es nicht (Nettleton 1939).</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="209" />
      <source>Geology that follows the topography gives the same signature, so treat it as a prompt to check the density, not as an estimate.</source>
      <translation>Eine Geologie, die der Topographie folgt, hinterlässt dieselbe Spur; nehmen Sie dies daher als Anlass, die Dichte zu prüfen, nicht als Schätzung.</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="185" />
      <source>Histograms of the anomalies</source>
      <translation>Histogramme der Anomalien</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="233" />
      <source>Largest corrections</source>
      <translation>Größte Korrektionen</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="255" />
      <source>Map of {}</source>
      <translation>Karte von {}</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="227" />
      <source>Median inner-zone share of the total: {} %.</source>
      <translation>Median des Anteils der inneren Zone an der Gesamtkorrektion: {} %.</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="175" />
      <source>No anomaly field to map.</source>
      <translation>Kein Anomaliefeld für eine Karte.</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="177" />
      <source>No anomaly grid was given: stations coloured by {} (mGal).</source>
      <translation>Kein Anomaliegitter angegeben: Stationen nach {} (mGal) eingefärbt.</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="165" />
      <source>No station carries a flag.</source>
      <translation>Keine Station trägt ein Kennzeichen.</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="195" />
      <source>No station height in the layer: this check needs the height the reduction used.</source>
      <translation>Keine Stationshöhe im Layer: diese Prüfung braucht die Höhe, die die Reduktion verwendet hat.</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="240" />
      <source>No terrain correction in the layer: the complete Bouguer anomaly is not available.</source>
      <translation>Keine Geländekorrektion im Layer: die vollständige Bouguer-Anomalie ist nicht verfügbar.</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="264" />
      <source>None.</source>
      <translation>Keine.</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="97" />
      <source>Not a code of this version's flag vocabulary (an older or newer run); shown as written.</source>
      <translation>Kein Code des Kennzeichen-Vokabulars dieser Version (ein älterer oder neuerer Lauf); wie geschrieben angezeigt.</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="255" />
      <source>One standard deviation, mGal.</source>
      <translation>Eine Standardabweichung, mGal.</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="43" />
      <source>Results support interpretation only: they are not a basis on their own for drilling, groundwater or engineering decisions.</source>
      <translation>Die Ergebnisse dienen nur der Interpretation: sie sind für sich allein keine Grundlage für Entscheidungen über Bohrungen, Grundwasser oder Bauwerke.</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="166" />
      <source>Stations</source>
      <translation>Stationen</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="178" />
      <source>Stations coloured by {}</source>
      <translation>Stationen nach {} eingefärbt</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="290" />
      <source>Survey report: {}</source>
      <translation>Vermessungsbericht: {}</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="224" />
      <source>Terrain correction by zone</source>
      <translation>Geländekorrektion nach Zonen</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="242" />
      <source>Terrain correction by zone (mGal)</source>
      <translation>Geländekorrektion nach Zonen (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="204" />
      <source>The Bouguer anomaly changes by {} mGal per metre of height. Read as a slab alone this would mean a density {} kg/m³ from the one used</source>
      <translation>Die Bouguer-Anomalie ändert sich um {} mGal je Meter Höhe. Allein als Platte gelesen hieße das eine Dichte, die um {} kg/m³ von der verwendeten abweicht</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="125" />
      <source>The layers carry no provenance record, so the parameters of the run cannot be shown. Outputs of this plugin's algorithms record them in their own metadata.</source>
      <translation>Die Layer tragen keinen Herkunftsnachweis, daher können die Parameter des Laufs nicht gezeigt werden. Ausgaben der Algorithmen dieses Plugins halten sie in ihren eigenen Metadaten fest.</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="236" />
      <source>The terrain correction is not split by zone (a field value was used).</source>
      <translation>Die Geländekorrektion ist nicht nach Zonen aufgeteilt (ein Feldwert wurde verwendet).</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="249" />
      <source>This layer has no uncertainty fields (tc_sigma, cba_sigma or sigma_…): the run that made it did not estimate a per-station error, so none is shown. Do not read the anomalies as exact.</source>
      <translation>Dieser Layer hat keine Unsicherheitsfelder (tc_sigma, cba_sigma oder sigma_…): der Lauf, der ihn erzeugt hat, hat keinen Fehler je Station geschätzt, daher wird keiner gezeigt. Lesen Sie die Anomalien nicht als exakt.</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="247" />
      <source>Uncertainty</source>
      <translation>Unsicherheit</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="133" />
      <source>What was run</source>
      <translation>Was berechnet wurde</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="291" />
      <source>Written {} by Relief Gravity {}. {} stations.</source>
      <translation>Geschrieben am {} von Relief Gravity {}. {} Stationen.</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="123" />
      <source>algorithm</source>
      <translation>Algorithmus</translation>
    </message>
    <message>
      <location filename="../plugin/report/plots.py" line="98" />
      <source>anomaly (mGal)</source>
      <translation>Anomalie (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="163" />
      <source>code</source>
      <translation>Code</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="130" />
      <source>contour interval</source>
      <translation>Isolinienabstand</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="155" />
      <source>count</source>
      <translation>Anzahl</translation>
    </message>
    <message>
      <location filename="../plugin/report/plots.py" line="138" />
      <source>easting</source>
      <translation>Rechtswert</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="302" />
      <source>en</source>
      <translation>de</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="57" />
      <source>field</source>
      <translation>Feld</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="256" />
      <source>field (mGal, 1 sigma)</source>
      <translation>Feld (mGal, 1 Sigma)</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="151" />
      <source>flagged (any code)</source>
      <translation>gekennzeichnet (beliebiger Code)</translation>
    </message>
    <message>
      <location filename="../plugin/report/plots.py" line="112" />
      <source>inner zone</source>
      <translation>innere Zone</translation>
    </message>
    <message>
      <location filename="../plugin/report/plots.py" line="121" />
      <source>inner-zone share of the total (%)</source>
      <translation>Anteil der inneren Zone an der Gesamtkorrektion (%)</translation>
    </message>
    <message>
      <location filename="../plugin/report/plots.py" line="100" />
      <source>least-squares slope</source>
      <translation>Steigung nach kleinsten Quadraten</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="57" />
      <source>max</source>
      <translation>Max.</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="163" />
      <source>meaning</source>
      <translation>Bedeutung</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="57" />
      <source>median</source>
      <translation>Median</translation>
    </message>
    <message>
      <location filename="../plugin/report/plots.py" line="59" />
      <source>median {}</source>
      <translation>Median {}</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="57" />
      <source>min</source>
      <translation>Min.</translation>
    </message>
    <message>
      <location filename="../plugin/report/plots.py" line="139" />
      <source>northing</source>
      <translation>Hochwert</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="128" />
      <source>not recorded</source>
      <translation>nicht festgehalten</translation>
    </message>
    <message>
      <location filename="../plugin/report/plots.py" line="113" />
      <source>outer zone</source>
      <translation>äußere Zone</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="123" />
      <source>parameters</source>
      <translation>Parameter</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="130" />
      <source>reduction density</source>
      <translation>Reduktionsdichte</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="163" />
      <source>severity</source>
      <translation>Schwere</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="130" />
      <source>standard</source>
      <translation>Standard</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="234" />
      <location filename="../plugin/report/content.py" line="273" />
      <source>station</source>
      <translation>Station</translation>
    </message>
    <message>
      <location filename="../plugin/report/plots.py" line="97" />
      <source>station height (m)</source>
      <translation>Stationshöhe (m)</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="163" />
      <location filename="../plugin/report/plots.py" line="61" />
      <location filename="../plugin/report/plots.py" line="122" />
      <source>stations</source>
      <translation>Stationen</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="145" />
      <source>stations in the layer</source>
      <translation>Stationen im Layer</translation>
    </message>
    <message>
      <location filename="../plugin/report/plots.py" line="115" />
      <source>stations, sorted by total correction</source>
      <translation>Stationen, nach Gesamtkorrektion sortiert</translation>
    </message>
    <message>
      <location filename="../plugin/report/plots.py" line="116" />
      <source>terrain correction (mGal)</source>
      <translation>Geländekorrektion (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="123" />
      <source>time (UTC)</source>
      <translation>Zeit (UTC)</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="123" />
      <source>version</source>
      <translation>Version</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="148" />
      <source>with a value of {}</source>
      <translation>mit einem Wert von {}</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="273" />
      <source>worst severity</source>
      <translation>schwerste Stufe</translation>
    </message>
    <message>
      <location filename="../plugin/report/content.py" line="277" />
      <source>… and {} more flagged stations (see the layer).</source>
      <translation>… und {} weitere gekennzeichnete Stationen (siehe Layer).</translation>
    </message>
  </context>
  <context>
    <name>SurveyReportAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="70" />
      <source>&lt;p&gt;Writes one HTML file (images embedded, no external references: it opens offline in any browser) describing a station layer reduced by &lt;b&gt;bouguerreduction&lt;/b&gt;: what was run and with which parameters (read from the layers' provenance records), station counts, flags by code with their meaning and severity, the anomaly map (from &lt;b&gt;Anomaly grid&lt;/b&gt; and &lt;b&gt;Contours&lt;/b&gt; when given, else the stations coloured by their anomaly), histograms of the anomalies, the free-air and Bouguer anomalies against height, the terrain correction by zone, the uncertainty fields (tc_sigma, cba_sigma, sigma_…) when the layer has them, the flagged stations and the cautions.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Height field&lt;/b&gt;: empty = the height field recorded by the reduction, else none.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</source>
      <translation>&lt;p&gt;Schreibt eine HTML-Datei (Bilder eingebettet, keine externen Verweise: sie öffnet sich offline in jedem Browser), die einen mit &lt;b&gt;bouguerreduction&lt;/b&gt; reduzierten Stationslayer beschreibt: was mit welchen Parametern gelaufen ist (aus den Herkunftsangaben der Layer gelesen), Stationszahlen, Markierungen nach Code mit Bedeutung und Schweregrad, die Anomaliekarte (aus &lt;b&gt;Anomalieraster&lt;/b&gt; und &lt;b&gt;Isolinien&lt;/b&gt;, wenn angegeben, sonst die nach ihrer Anomalie eingefärbten Stationen), Histogramme der Anomalien, Freiluft- und Bouguer-Anomalien gegen die Höhe, die Geländekorrektion je Zone, die Unsicherheitsfelder (tc_sigma, cba_sigma, sigma_…), sofern der Layer sie hat, die markierten Stationen und die Warnhinweise.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Höhenfeld&lt;/b&gt;: leer = das von der Reduktion aufgezeichnete Höhenfeld, sonst keines.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="94" />
      <source>Anomaly grid</source>
      <translation>Anomalieraster</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="164" />
      <source>Anomaly map</source>
      <translation>Anomaliekarte</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="106" />
      <source>Cancelled: no report written.</source>
      <translation>Abgebrochen: kein Bericht geschrieben.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="124" />
      <source>Choose a file for the report.</source>
      <translation>Wählen Sie eine Datei für den Bericht.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="97" />
      <source>Contours</source>
      <translation>Isolinien</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="154" />
      <source>Coordinates: {} ({}).</source>
      <translation>Koordinaten: {} ({}).</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="166" />
      <source>Gridded anomaly with contours and stations (mGal).</source>
      <translation>Interpolierte Anomalie mit Isolinien und Stationen (mGal).</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="101" />
      <source>HTML files (*.html *.htm)</source>
      <translation>HTML-Dateien (*.html *.htm)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="61" />
      <source>Maps</source>
      <translation>Karten</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="85" />
      <source>Reduced stations</source>
      <translation>Reduzierte Stationen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="160" />
      <source>Rendering the anomaly map…</source>
      <translation>Anomaliekarte wird gezeichnet…</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="101" />
      <source>Report</source>
      <translation>Bericht</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="182" />
      <source>Report written to {} ({} stations).</source>
      <translation>Bericht nach {} geschrieben ({} Stationen).</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="90" />
      <source>Station height field (m)</source>
      <translation>Feld der Stationshöhe (m)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="55" />
      <source>Survey report (HTML)</source>
      <translation>Messgebietsbericht (HTML)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="151" />
      <source>The station layer has no features: nothing to report.</source>
      <translation>Der Stationslayer hat keine Objekte: es gibt nichts zu berichten.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="117" />
      <source>The station layer has none of the fields faa, sba or cba: run the Bouguer reduction (reliefgravity:bouguerreduction) on it first and report on its output.</source>
      <translation>Der Stationslayer hat keines der Felder faa, sba oder cba: führen Sie zuerst die Bouguer-Reduktion (reliefgravity:bouguerreduction) darauf aus und berichten Sie über deren Ausgabe.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="64" />
      <source>Writes one self-contained HTML report of a reduced station layer: runs, flags, maps, plots.</source>
      <translation>Schreibt einen eigenständigen HTML-Bericht über einen reduzierten Stationslayer: Läufe, Markierungen, Karten, Diagramme.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/survey_report.py" line="67" />
      <source>gravity,report,html,bouguer,anomaly,terrain,flags,uncertainty</source>
      <translation>Schwere,Bericht,HTML,Bouguer,Anomalie,Gelände,Markierungen,Unsicherheit</translation>
    </message>
  </context>
  <context>
    <name>TerrainCorrectionAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="68" />
      <source>&lt;p&gt;Computes the terrain correction of every station (mGal, positive for relief above or below the station) and adds &lt;b&gt;tc_inner&lt;/b&gt;, &lt;b&gt;tc_outer&lt;/b&gt;, &lt;b&gt;tc_total&lt;/b&gt;, &lt;b&gt;dem_diff&lt;/b&gt; (station height minus DEM height, m: large values point to mislocated stations), &lt;b&gt;tc_cover&lt;/b&gt; (fraction of the zone area covered by the rasters) and &lt;b&gt;qc_flag&lt;/b&gt; to a copy of the layer.&lt;/p&gt;&lt;p&gt;Exact engine (default): the innermost ring is modelled from the station height and the local DEM surface (or replaced by a field estimate); the inner zone to the inner radius uses exact prisms at full DEM resolution; the outer zone to the outer radius uses progressively coarser cells, then the regional raster beyond the fine one, with Earth curvature. Geographic (degree) rasters work: distances are on the ground.&lt;/p&gt;&lt;p&gt;Ring-and-sector (Hammer 1939): the chosen contiguous zones out of B to M (2 m to 21.94 km, compartments lowered by the Earth-curvature drop; terrain beyond the last zone is not corrected, and the log says how far it reaches) with compartment mean heights from the DEM, and from the regional raster where the DEM has no data; zones narrower than a DEM cell hold the plane through the station with the DEM's slope. A zone counts to tc_inner when it ends within the inner zone radius; a zone the radius cuts is split there. For comparison with chart-based field practice; optionally one field per zone.&lt;/p&gt;&lt;p&gt;Station heights come from the height field (the height difference is always taken from the station's own height) or, when empty, from the DEM.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Datums&lt;/b&gt;: station heights are converted to the DEM's datum before the comparison (HEIGHT_DATUM, DEM_DATUM; EGM96 from PROJ's egm96_15.gtx). Stations differing from the DEM beyond the local relief are flagged height_dem_mismatch, and the log names the setting when most differ by about the geoid height.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Limits&lt;/b&gt;: density 500-5000 kg/m³; inner radius above 0 and below the outer radius (default 895 m, the outer edge of Hammer zone F); a regional elevation raster reaching 166.7 km is needed for the standard correction. qc_flag holds codes, qc_note their meaning.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</source>
      <translation>&lt;p&gt;Berechnet die Geländekorrektion jeder Station (mGal, positiv für Relief über oder unter der Station) und fügt einer Kopie des Layers &lt;b&gt;tc_inner&lt;/b&gt;, &lt;b&gt;tc_outer&lt;/b&gt;, &lt;b&gt;tc_total&lt;/b&gt;, &lt;b&gt;dem_diff&lt;/b&gt; (Stationshöhe minus DGM-Höhe, m: große Werte deuten auf falsch verortete Stationen), &lt;b&gt;tc_cover&lt;/b&gt; (von den Rastern abgedeckter Anteil der Zonenfläche) und &lt;b&gt;qc_flag&lt;/b&gt; hinzu.&lt;/p&gt;&lt;p&gt;Exaktes Verfahren (Standard): der innerste Ring wird aus der Stationshöhe und der örtlichen DGM-Oberfläche modelliert (oder durch eine Feldschätzung ersetzt); die Innenzone bis zum Innenradius verwendet exakte Prismen in voller DGM-Auflösung; die Außenzone bis zum Außenradius verwendet zunehmend gröbere Zellen, jenseits des feinen Rasters dann das regionale Raster, mit Erdkrümmung. Geographische Raster (in Grad) funktionieren: die Abstände werden auf der Erdoberfläche gemessen.&lt;/p&gt;&lt;p&gt;Ringe und Sektoren (Hammer 1939): die gewählten zusammenhängenden Zonen aus B bis M (2 m bis 21,94 km, Kompartimente um die Absenkung durch die Erdkrümmung tiefer gelegt; Gelände jenseits der letzten Zone wird nicht korrigiert, und das Protokoll gibt an, wie weit sie reicht) mit mittleren Kompartimenthöhen aus dem DGM und aus dem regionalen Raster, wo das DGM keine Daten hat; Zonen, die schmaler als eine DGM-Zelle sind, enthalten die Ebene durch die Station mit der Neigung des DGM. Eine Zone zählt zu tc_inner, wenn sie innerhalb des Innenzonenradius endet; eine vom Radius geschnittene Zone wird dort geteilt. Zum Vergleich mit der diagrammgestützten Feldpraxis; optional ein Feld je Zone.&lt;/p&gt;&lt;p&gt;Stationshöhen stammen aus dem Höhenfeld (der Höhenunterschied wird stets von der eigenen Höhe der Station aus genommen) oder, wenn es leer ist, aus dem DGM.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Höhenbezugssysteme&lt;/b&gt;: Stationshöhen werden vor dem Vergleich in den Höhenbezug des DGM umgerechnet (HEIGHT_DATUM, DEM_DATUM; EGM96 aus egm96_15.gtx von PROJ). Stationen, die stärker vom DGM abweichen, als das örtliche Relief erklärt, werden mit height_dem_mismatch markiert, und das Protokoll nennt die Einstellung, wenn die meisten um etwa die Geoidhöhe abweichen.&lt;/p&gt;&lt;p&gt;&lt;b&gt;Grenzen&lt;/b&gt;: Dichte 500-5000 kg/m³; Innenradius über 0 und unter dem Außenradius (Standard 895 m, der äußere Rand der Hammer-Zone F); für die Standardkorrektion wird ein regionales Höhenraster benötigt, das bis 166,7 km reicht. qc_flag enthält Codes, qc_note deren Bedeutung.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="114" />
      <source>Elevation raster (DEM, metres)</source>
      <translation>Höhenraster (DGM, Meter)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="143" />
      <source>Exact engine (prisms, DEM-driven)</source>
      <translation>Exaktes Verfahren (Prismen, aus dem DGM)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="123" />
      <source>Field-estimated innermost-ring correction (mGal)</source>
      <translation>Im Feld geschätzte Korrektion des innersten Rings (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="207" />
      <source>Hammer zones: {}</source>
      <translation>Hammer-Zonen: {}</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="141" />
      <source>Method</source>
      <translation>Verfahren</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="144" />
      <source>Ring-and-sector (Hammer 1939 zones B-M)</source>
      <translation>Ringe und Sektoren (Hammer 1939, Zonen B-M)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="223" />
      <source>Ring-and-sector zones {} cover {:.1f} m to {:.2f} km; terrain nearer (except a field-estimated innermost correction) and beyond is not corrected.</source>
      <translation>Die Zonen {} der Ringe und Sektoren decken {:.1f} m bis {:.2f} km ab; näheres Gelände (außer einer im Feld geschätzten Korrektion des innersten Rings) und ferneres wird nicht korrigiert.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="217" />
      <source>Ring-and-sector zones {} reach {:.2f} km; terrain beyond is not corrected.</source>
      <translation>Die Zonen {} der Ringe und Sektoren reichen bis {:.2f} km; Gelände jenseits davon wird nicht korrigiert.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="158" />
      <source>Ring-and-sector: Hammer zones (contiguous letters out of B-M, or a range such as B-M)</source>
      <translation>Ringe und Sektoren: Hammer-Zonen (zusammenhängende Buchstaben aus B-M oder ein Bereich wie B-M)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="150" />
      <source>Ring-and-sector: one field per Hammer zone</source>
      <translation>Ringe und Sektoren: ein Feld je Hammer-Zone</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="107" />
      <source>Station height field (empty = sample the elevation raster)</source>
      <translation>Feld der Stationshöhe (leer = aus dem Höhenraster)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="168" />
      <source>Stations computed</source>
      <translation>Berechnete Stationen (Anzahl)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="169" />
      <source>Stations flagged</source>
      <translation>Markierte Stationen (Anzahl)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="165" />
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
      <location filename="../plugin/toolbox/terrain_correction.py" line="131" />
      <source>Treat cells below sea level as water of this density (kg/m³)</source>
      <translation>Zellen unter dem Meeresspiegel als Wasser dieser Dichte behandeln (kg/m³)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="230" />
      <source>Zones {} are narrower than a DEM cell: they hold the plane through the station with the DEM's slope there instead of DEM heights.</source>
      <translation>Die Zonen {} sind schmaler als eine DGM-Zelle: sie enthalten die Ebene durch die Station mit der dortigen Neigung des DGM statt der DGM-Höhen.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="250" />
      <source>elevation raster</source>
      <translation>Höhenraster</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="184" />
      <source>geoid height</source>
      <translation>Geoidhöhe</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="65" />
      <source>gravity,terrain correction,inner zone,outer zone,Hammer zones,DEM,Bouguer</source>
      <translation>Schwere,Geländekorrektion,Innenzone,Außenzone,Hammer-Zonen,DGM,Bouguer</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="183" />
      <source>innermost-ring correction</source>
      <translation>Korrektion des innersten Rings</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="252" />
      <source>regional elevation raster</source>
      <translation>regionales Höhenraster</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="182" />
      <source>station height</source>
      <translation>Stationshöhe</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="328" />
      <source>{} stations: terrain correction computed for {}, {} flagged.</source>
      <translation>{} Stationen: Geländekorrektion für {} berechnet, {} markiert.</translation>
    </message>
  </context>
  <context>
    <name>TerrainRun</name>
    <message>
      <location filename="../plugin/terrain_run.py" line="171" />
      <location filename="../plugin/terrain_run.py" line="187" />
      <source>Cancelled by the user.</source>
      <translation>Vom Benutzer abgebrochen.</translation>
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="93" />
      <source>Densities from a geology layer need the exact engine: the ring-and-sector method has one density per station. Choose the exact engine or leave DENSITY_LAYER empty.</source>
      <translation>Dichten aus einem Geologielayer brauchen das exakte Verfahren: das Ringe-und-Sektoren-Verfahren hat eine Dichte je Station. Wählen Sie das exakte Verfahren oder lassen Sie DENSITY_LAYER leer.</translation>
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="189" />
      <source>Engine error against the refined evaluation: median {:.2g}, largest {:.2g} mGal.</source>
      <translation>Rechenfehler gegenüber der verfeinerten Auswertung: Median {:.2g}, größter Wert {:.2g} mGal.</translation>
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="181" />
      <source>Estimating the engine's own error against a refined evaluation (tc_numerr).</source>
      <translation>Der eigene Rechenfehler wird gegen eine verfeinerte Auswertung geschätzt (tc_numerr).</translation>
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="33" />
      <source>No station lies on the {} (raster extent {:.6g}, {:.6g}, {:.6g}, {:.6g} in its own CRS). Check that the raster covers the survey and that both layers have the right CRS.</source>
      <translation>Keine Station liegt auf {} (Rasterausdehnung {:.6g}, {:.6g}, {:.6g}, {:.6g} in seinem eigenen KBS). Prüfen Sie, ob das Raster das Messgebiet abdeckt und beide Layer das richtige KBS haben.</translation>
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="104" />
      <source>Reprojecting the regional elevation raster to the CRS of the fine one.</source>
      <translation>Das regionale Höhenraster wird in das KBS des feinen Rasters umprojiziert.</translation>
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="199" />
      <source>The elevation rasters stop short of the outer radius for {} station(s): the terrain they miss could add about {:.3f} mGal at worst (station {}; field tc_trunc, an estimate from the relief at the edge of coverage, not a bound). Give a regional DEM reaching {:.0f} m around every station.</source>
      <translation>Die Höhenraster enden für {} Station(en) vor dem Außenradius: das fehlende Gelände könnte im ungünstigsten Fall etwa {:.3f} mGal beitragen (Station {}; Feld tc_trunc, eine Schätzung aus dem Relief am Rand der Abdeckung, keine Schranke). Geben Sie ein regionales DGM an, das {:.0f} m um jede Station reicht.</translation>
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="175" />
      <source>The engine's own error (ENGINE_CHECK) is not estimated with a geology layer: no tc_numerr field is written.</source>
      <translation>Der eigene Fehler des Verfahrens (ENGINE_CHECK) wird mit einem Geologielayer nicht geschätzt: es wird kein Feld tc_numerr geschrieben.</translation>
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="54" />
      <source>elevation raster</source>
      <translation>Höhenraster</translation>
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="220" />
      <source>height from DEM</source>
      <translation>Höhe aus DGM</translation>
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="221" />
      <source>no height (outside DEM)</source>
      <translation>keine Höhe (außerhalb des DGM)</translation>
    </message>
  </context>
  <context>
    <name>Uncertainty</name>
    <message>
      <location filename="../plugin/uncertainty_run.py" line="63" />
      <source>DEM vertical random error per cell, one sigma (m)</source>
      <translation>Zufälliger Höhenfehler des DGM je Zelle, eine Standardabweichung (m)</translation>
    </message>
    <message>
      <location filename="../plugin/uncertainty_run.py" line="84" />
      <source>Give both bounds of the density interval (DENSITY_LOW and DENSITY_HIGH), or neither.</source>
      <translation>Geben Sie beide Grenzen des Dichteintervalls an (DENSITY_LOW und DENSITY_HIGH) oder keine.</translation>
    </message>
    <message>
      <location filename="../plugin/uncertainty_run.py" line="59" />
      <source>Observed gravity error, one sigma (mGal; a g_sigma field of the input is used instead)</source>
      <translation>Fehler der gemessenen Schwere, eine Standardabweichung (mGal; ein Feld g_sigma der Eingabe wird stattdessen verwendet)</translation>
    </message>
    <message>
      <location filename="../plugin/uncertainty_run.py" line="67" />
      <source>Reduction density, lower bound of its 95 % interval (kg/m³)</source>
      <translation>Reduktionsdichte, untere Grenze ihres 95-%-Intervalls (kg/m³)</translation>
    </message>
    <message>
      <location filename="../plugin/uncertainty_run.py" line="71" />
      <source>Reduction density, upper bound of its 95 % interval (kg/m³)</source>
      <translation>Reduktionsdichte, obere Grenze ihres 95-%-Intervalls (kg/m³)</translation>
    </message>
    <message>
      <location filename="../plugin/uncertainty_run.py" line="55" />
      <source>Station height error field (m; replaces the number where set)</source>
      <translation>Feld des Stationshöhenfehlers (m; ersetzt den Zahlenwert, wo gesetzt)</translation>
    </message>
    <message>
      <location filename="../plugin/uncertainty_run.py" line="51" />
      <source>Station height error, one sigma (m)</source>
      <translation>Fehler der Stationshöhe, eine Standardabweichung (m)</translation>
    </message>
    <message>
      <location filename="../plugin/uncertainty_run.py" line="86" />
      <source>The density interval {} to {} kg/m³ is impossible: the lower bound must be positive and not above the upper bound.</source>
      <translation>Das Dichteintervall {} bis {} kg/m³ ist unmöglich: die untere Grenze muss positiv sein und darf die obere nicht übersteigen.</translation>
    </message>
  </context>
</TS>
