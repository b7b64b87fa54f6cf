<?xml version="1.0" encoding="utf-8"?>
<!DOCTYPE TS>
<TS version="2.1" language="de">
  <context>
    <name>AnomalyGridAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="93" />
      <source>&lt;p&gt;Grids a numeric anomaly field (default &lt;b&gt;cba&lt;/b&gt;, mGal) of a point layer by minimum curvature with tension (Briggs 1974; Smith &amp;amp; Wessel 1990) into a float32 GeoTIFF in the stations' CRS, and optionally draws contour lines with a &lt;b&gt;value&lt;/b&gt; field (mGal).&lt;/p&gt;&lt;p&gt;&lt;b&gt;Pixel size&lt;/b&gt;: empty = half the median distance between neighbouring stations, rounded down to 1, 2, 2.5 or 5 times a power of ten. &lt;b&gt;Extent&lt;/b&gt;: empty = the stations' bounding box plus 5 % of its longer side; edges are snapped to whole cells. &lt;b&gt;Tension&lt;/b&gt;: 0 = pure minimum curvature (smoothest, may overshoot), 1 = no new extrema between stations; 0.25 suits potential-field data. &lt;b&gt;Blanking distance&lt;/b&gt;: cells farther than this from every station become NoData; empty = three times the median station spacing, 0 = no blanking. &lt;b&gt;Contour interval&lt;/b&gt;: empty = a round interval (1, 2, 2.5 or 5 times a power of ten) giving about 10 to 15 contours.&lt;/p&gt;&lt;p&gt;Stations with an empty or non-numeric value are skipped and counted in the log; at least 3 are needed. The stations must be in a projected CRS (metres): reproject a layer in degrees first.&lt;/p&gt;&lt;p&gt;When loaded into a project the raster gets a histogram-equalised colour ramp between the 2nd and 98th percentiles and the contours are labelled. The same styles ship as .qml files in the plugin's plugin/styles folder.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="125" />
      <source>Anomaly field to grid (mGal)</source>
      <translation>Zu interpolierendes Anomaliefeld (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="319" />
      <source>Anomaly field {} of {} stations, gridded by minimum curvature with tension {} on {} {} cells; values in mGal; cells farther than {:.6g} {} from a station are NoData (0 = no blanking).</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="78" />
      <source>Anomaly grid and contours (minimum curvature)</source>
      <translation>Anomalieraster und Isolinien (minimale Krümmung)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="177" />
      <source>Anomaly raster</source>
      <translation>Anomalieraster</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="318" />
      <source>Anomaly {} (mGal)</source>
      <translation>Anomalie {} (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="283" />
      <source>Automatic blanking distance: {:.6g} {} (3 station spacings).</source>
      <translation>Automatischer Ausblendabstand: {:.6g} {} (3 Stationsabstände).</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="159" />
      <source>Blanking distance (empty = 3 station spacings, 0 = none)</source>
      <translation>Ausblendabstand (leer = 3 Stationsabstände, 0 = keiner)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="190" />
      <source>Blanking distance used</source>
      <translation>Verwendeter Ausblendabstand</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="169" />
      <source>Contour interval (mGal, empty = automatic)</source>
      <translation>Isolinienabstand (mGal, leer = automatisch)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="191" />
      <source>Contour interval used (mGal)</source>
      <translation>Verwendeter Isolinienabstand (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="182" />
      <source>Contours</source>
      <translation>Isolinien</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="356" />
      <source>Contours {} ({:g} mGal)</source>
      <translation>Isolinien {} ({:g} mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="300" />
      <source>Every cell was blanked: increase the blanking distance or set it to 0.</source>
      <translation>Alle Zellen wurden ausgeblendet: vergrößern Sie den Ausblendabstand oder setzen Sie ihn auf 0.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="119" />
      <source>Gravity stations</source>
      <translation>Schwerestationen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="143" />
      <source>Grid extent (empty = stations plus a margin)</source>
      <translation>Rasterausdehnung (leer = Stationen plus Rand)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="273" />
      <source>Grid: {} columns x {} rows of {} {} cells, tension {}.</source>
      <translation>Raster: {} Spalten x {} Zeilen zu {} {} Zellen, Spannung {}.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="87" />
      <source>Grids an anomaly field of a station layer into a styled raster and contour lines.</source>
      <translation>Interpoliert ein Anomaliefeld eines Stationslayers zu einem gestalteten Raster und Isolinien.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="84" />
      <source>Maps</source>
      <translation>Karten</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="246" />
      <source>Only {} station(s) have a value in the field {}; at least 3 are needed to grid.</source>
      <translation>Nur {} Station(en) haben einen Wert im Feld {}; zum Interpolieren sind mindestens 3 nötig.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="134" />
      <source>Pixel size (empty = automatic, from the station spacing)</source>
      <translation>Pixelgröße (leer = automatisch, aus dem Stationsabstand)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="189" />
      <source>Pixel size used</source>
      <translation>Verwendete Pixelgröße</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="188" />
      <source>Stations gridded</source>
      <translation>Interpolierte Stationen (Anzahl)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="149" />
      <source>Tension (0 = minimum curvature, 1 = no overshoot)</source>
      <translation>Spannung (0 = minimale Krümmung, 1 = kein Überschwingen)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="206" />
      <source>The stations are in a geographic CRS ({}), in degrees; gridding needs distances in metres. Reproject the station layer to a projected CRS (for example the local UTM zone) with Vector &gt; Data Management Tools &gt; Reproject Layer, then grid the copy.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="290" />
      <source>The stations cannot be gridded: {}</source>
      <translation>Die Stationen können nicht interpoliert werden: {}</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="333" />
      <source>The surface is flat ({} mGal): no contours.</source>
      <translation>Die Fläche ist eben ({} mGal): keine Isolinien.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="198" />
      <location filename="../plugin/toolbox/anomaly_grid.py" line="227" />
      <source>anomaly</source>
      <translation>Anomalie</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="90" />
      <source>gravity,anomaly,bouguer,grid,raster,contour,minimum curvature,tension</source>
      <translation>Schwere,Anomalie,Bouguer,Raster,Isolinien,minimale Krümmung,Spannung</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="353" />
      <source>{} contour lines every {:g} mGal.</source>
      <translation>{} Isolinien im Abstand von {:g} mGal.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="240" />
      <source>{} of {} stations skipped: no geometry or no numeric value in {}.</source>
      <translation>{} von {} Stationen übersprungen: keine Geometrie oder kein Zahlenwert in {}.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/anomaly_grid.py" line="308" />
      <source>{} stations gridded; {} of {} cells have a value, from {:.3f} to {:.3f} mGal.</source>
      <translation>{} Stationen interpoliert; {} von {} Zellen haben einen Wert, von {:.3f} bis {:.3f} mGal.</translation>
    </message>
  </context>
  <context>
    <name>AnomalyMap</name>
    <message>
      <location filename="../plugin/render.py" line="111" />
      <location filename="../plugin/render.py" line="112" />
      <source>Anomaly (mGal)</source>
      <translation>Anomalie (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="145" />
      <source>Complete Bouguer anomaly</source>
      <translation>Vollständige Bouguer-Anomalie</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="114" />
      <location filename="../plugin/render.py" line="116" />
      <source>Contours (mGal)</source>
      <translation>Isolinien (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="59" />
      <source>Could not open {} as a map layer.</source>
      <translation>{} konnte nicht als Kartenlayer geöffnet werden.</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="208" />
      <source>Could not write the map image {} (layout export status {}).</source>
      <translation>Das Kartenbild {} konnte nicht geschrieben werden (Exportstatus {}).</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="159" />
      <source>Legend</source>
      <translation>Legende</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="118" />
      <source>Stations</source>
      <translation>Stationen</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="172" />
      <source>km</source>
      <translation>km</translation>
    </message>
    <message>
      <location filename="../plugin/render.py" line="172" />
      <source>m</source>
      <translation>m</translation>
    </message>
  </context>
  <context>
    <name>AnomalyStyles</name>
    <message>
      <location filename="../plugin/styling.py" line="177" />
      <source>Anomaly (mGal)</source>
      <translation>Anomalie (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/styling.py" line="219" />
      <source>Anomaly contours (mGal)</source>
      <translation>Anomalie-Isolinien (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/styling.py" line="220" />
      <source>Contour lines of the gridded anomaly; field value in mGal.</source>
      <translation>Isolinien der interpolierten Anomalie; Feld value in mGal.</translation>
    </message>
    <message>
      <location filename="../plugin/styling.py" line="294" />
      <source>Could not save the style {}: {}</source>
      <translation>Der Stil {} konnte nicht gespeichert werden: {}</translation>
    </message>
    <message>
      <location filename="../plugin/styling.py" line="178" />
      <source>Gravity anomaly in mGal.</source>
      <translation>Schwereanomalie in mGal.</translation>
    </message>
  </context>
  <context>
    <name>BouguerReductionAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="136" />
      <source>1967 formula (legacy databases)</source>
      <translation>Formel von 1967 (ältere Datenbanken)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="64" />
      <source>&lt;p&gt;Adds normal gravity, every correction and the free-air (&lt;b&gt;faa&lt;/b&gt;), simple Bouguer (&lt;b&gt;sba&lt;/b&gt;) and complete Bouguer (&lt;b&gt;cba&lt;/b&gt;) anomalies to a copy of a station point layer. All values in mGal.&lt;/p&gt;&lt;p&gt;Default standard: Hinze et al. (2005): GRS80 normal gravity, second-order height correction, atmospheric correction, spherical-cap Bouguer correction to 166.7 km (slab + curvature, LaFehr 1991) and terrain correction to 166.7 km. Heights are heights above the ellipsoid. The 1967 formula, the first-order 0.3086 mGal/m gradient and a flat slab are options to reproduce legacy databases.&lt;/p&gt;&lt;p&gt;faa = g_obs - normal_g + height_corr + atmos_corr; sba = faa - slab_corr - curv_corr; cba = sba + tc_total.&lt;/p&gt;&lt;p&gt;The terrain correction comes from the terrain-correction field when one is chosen, otherwise from the elevation raster with the exact prism engine (inner zone to the inner radius, outer zone to the outer radius); without either, cba is left empty.&lt;/p&gt;&lt;p&gt;Station height: from the height field, or sampled from the elevation raster when no field is chosen (flagged in qc_flag). A station that cannot be reduced keeps its row with empty values and a reason in qc_flag.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="154" />
      <source>Apply the atmospheric correction</source>
      <translation>Atmosphärenkorrektion anbringen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="55" />
      <source>Bouguer reduction (free-air, simple and complete Bouguer anomalies)</source>
      <translation>Bouguer-Reduktion (Freiluft-, einfache und vollständige Bouguer-Anomalie)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="207" />
      <source>Choose a station height field or an elevation raster to sample heights from.</source>
      <translation>Wählen Sie ein Feld der Stationshöhe oder ein Höhenraster, aus dem Höhen entnommen werden.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="108" />
      <source>Elevation raster (DEM, metres)</source>
      <translation>Höhenraster (DGM, Meter)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="167" />
      <source>Existing terrain-correction field (mGal)</source>
      <translation>Vorhandenes Feld der Geländekorrektion (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="147" />
      <source>First order, 0.3086 mGal/m</source>
      <translation>Erster Ordnung, 0,3086 mGal/m</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="134" />
      <source>GRS80 (Somigliana closed form)</source>
      <translation>GRS80 (geschlossene Formel nach Somigliana)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="144" />
      <source>Height (free-air) correction</source>
      <translation>Höhenkorrektion (Freiluft)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="254" />
      <source>No terrain-correction field and no elevation raster: cba is left empty.</source>
      <translation>Weder Geländekorrektionsfeld noch Höhenraster: cba bleibt leer.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="132" />
      <source>Normal gravity</source>
      <translation>Normalschwere</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="91" />
      <source>Observed gravity field (mGal)</source>
      <translation>Feld der gemessenen Schwere (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="176" />
      <source>Reduced stations</source>
      <translation>Reduzierte Stationen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="58" />
      <source>Reduces observed gravity at stations to free-air, simple and complete Bouguer anomalies.</source>
      <translation>Reduziert die gemessene Schwere an Stationen auf Freiluft-, einfache und vollständige Bouguer-Anomalien.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="115" />
      <source>Reduction density field, per station</source>
      <translation>Feld der Reduktionsdichte je Station</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="146" />
      <source>Second order, latitude dependent (Hinze et al. 2005)</source>
      <translation>Zweiter Ordnung, breitenabhängig (Hinze et al. 2005)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="160" />
      <source>Spherical cap to 166.7 km (add the curvature correction to the slab)</source>
      <translation>Kugelkappe bis 166,7 km (Krümmungskorrektion zur Platte)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="99" />
      <source>Station height field (above the ellipsoid; empty = sample the elevation raster)</source>
      <translation>Feld der Stationshöhe (über dem Ellipsoid; leer = aus dem Höhenraster)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="180" />
      <source>Stations flagged</source>
      <translation>Markierte Stationen (Anzahl)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="179" />
      <source>Stations reduced</source>
      <translation>Reduzierte Stationen (Anzahl)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="123" />
      <source>Units of the density field</source>
      <translation>Einheit des Dichtefeldes</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="135" />
      <source>WGS84 (Somigliana closed form)</source>
      <translation>WGS84 (geschlossene Formel nach Somigliana)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="195" />
      <source>density</source>
      <translation>Dichte</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="298" />
      <source>density missing, default used</source>
      <translation>Dichte fehlt, Vorgabe verwendet</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="124" />
      <source>g/cm³</source>
      <translation>g/cm³</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="61" />
      <source>gravity,bouguer,free-air,normal gravity,terrain correction,anomaly,GRS80</source>
      <translation>Schwere,Bouguer,Freiluft,Normalschwere,Geländekorrektion,Anomalie,GRS80</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="124" />
      <source>kg/m³</source>
      <translation>kg/m³</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="193" />
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="221" />
      <source>observed gravity</source>
      <translation>gemessene Schwere</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="194" />
      <source>station height</source>
      <translation>Stationshöhe</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="196" />
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="234" />
      <source>terrain correction</source>
      <translation>Geländekorrektion</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="308" />
      <source>unusual density</source>
      <translation>ungewöhnliche Dichte</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="304" />
      <source>{} station(s) have a reduction density outside {}-{} kg/m³ (e.g. {}); check the units.</source>
      <translation>{} Station(en) haben eine Reduktionsdichte außerhalb {}-{} kg/m³ (z. B. {}); prüfen Sie die Einheit.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/bouguer_reduction.py" line="280" />
      <source>{} stations: {} with a free-air anomaly, {} with a complete Bouguer anomaly, {} flagged.</source>
      <translation>{} Stationen: {} mit Freiluftanomalie, {} mit vollständiger Bouguer-Anomalie, {} markiert.</translation>
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
      <location filename="../plugin/raster_io.py" line="154" />
      <source>The elevation raster {} has no coordinate reference system.</source>
      <translation>Das Höhenraster {} hat kein Koordinatenbezugssystem.</translation>
    </message>
    <message>
      <location filename="../plugin/raster_io.py" line="38" />
      <source>The elevation raster {} is rotated; warp it to a north-up grid first.</source>
      <translation>Das Höhenraster {} ist gedreht; transformieren Sie es zuerst in ein nordorientiertes Gitter.</translation>
    </message>
    <message>
      <location filename="../plugin/raster_io.py" line="143" />
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
    <name>ReliefGravityAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/base.py" line="139" />
      <source>A reduction density of {} kg/m³ looks like g/cm³: enter 2670 for 2.67 g/cm³.</source>
      <translation>Eine Reduktionsdichte von {} kg/m³ sieht nach g/cm³ aus: geben Sie 2670 für 2,67 g/cm³ ein.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="94" />
      <source>Feet</source>
      <translation>Fuß</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="44" />
      <source>Gravity reduction</source>
      <translation>Schwerereduktion</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="86" />
      <source>Gravity stations</source>
      <translation>Schwerestationen</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="94" />
      <source>Height units</source>
      <translation>Höheneinheit</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="120" />
      <source>Inner zone radius (m)</source>
      <translation>Radius der Innenzone (m)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="94" />
      <source>Metres</source>
      <translation>Meter</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="121" />
      <source>Outer zone radius (m)</source>
      <translation>Radius der Außenzone (m)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="104" />
      <source>Reduction density (kg/m³)</source>
      <translation>Reduktionsdichte (kg/m³)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="116" />
      <source>Regional elevation raster for the outer zone</source>
      <translation>Regionales Höhenraster für die Außenzone</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="15" />
      <source>Results support interpretation only. Check every reduction against the survey's own ties and specifications; decisions on drilling, groundwater or engineering, and reporting under a jurisdiction's rules, are for licensed practice and local codes.</source>
      <translation>Die Ergebnisse dienen nur der Interpretation. Prüfen Sie jede Reduktion an den Anschlussmessungen und Vorgaben der Vermessung; Entscheidungen über Bohrungen, Grundwasser oder Bauvorhaben sowie Berichte nach den Regeln einer Rechtsordnung sind Sache zugelassener Fachleute und örtlicher Vorschriften.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="143" />
      <source>The inner zone radius ({} m) must be positive and smaller than the outer zone radius ({} m).</source>
      <translation>Der Radius der Innenzone ({} m) muss positiv und kleiner als der Radius der Außenzone ({} m) sein.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="188" />
      <source>The input already has a field {}; its values are replaced in the output copy.</source>
      <translation>Die Eingabe hat bereits ein Feld {}; seine Werte werden in der Ausgabekopie ersetzt.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="137" />
      <source>The reduction density must be positive (kg/m³); got {}.</source>
      <translation>Die Reduktionsdichte muss positiv sein (kg/m³); erhalten: {}.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/base.py" line="177" />
      <source>height</source>
      <translation>Höhe</translation>
    </message>
  </context>
  <context>
    <name>ReliefGravityProvider</name>
    <message>
      <location filename="../plugin/provider.py" line="34" />
      <source>Relief Gravity</source>
      <translation>Relief Gravity</translation>
    </message>
    <message>
      <location filename="../plugin/provider.py" line="37" />
      <source>Relief Gravity (land gravity reduction)</source>
      <translation>Relief Gravity (Reduktion von Landschweremessungen)</translation>
    </message>
  </context>
  <context>
    <name>StationTable</name>
    <message>
      <location filename="../plugin/stations.py" line="135" />
      <location filename="../plugin/stations.py" line="199" />
      <source>Cancelled by the user.</source>
      <translation>Vom Benutzer abgebrochen.</translation>
    </message>
    <message>
      <location filename="../plugin/stations.py" line="211" />
      <source>Could not write a station to the output layer.</source>
      <translation>Eine Station konnte nicht in den Ausgabelayer geschrieben werden.</translation>
    </message>
    <message>
      <location filename="../plugin/stations.py" line="126" />
      <source>The station layer has no coordinate reference system. Assign its CRS (Layer Properties &gt; Source) so latitudes can be computed.</source>
      <translation>Der Stationslayer hat kein Koordinatenbezugssystem. Weisen Sie sein KBS zu (Layereigenschaften &gt; Quelle), damit Breiten berechnet werden können.</translation>
    </message>
    <message>
      <location filename="../plugin/stations.py" line="149" />
      <source>The station layer has no features: there is nothing to reduce.</source>
      <translation>Der Stationslayer hat keine Objekte: es gibt nichts zu reduzieren.</translation>
    </message>
    <message>
      <location filename="../plugin/stations.py" line="165" />
      <source>latitude out of range</source>
      <translation>Breite außerhalb des Bereichs</translation>
    </message>
    <message>
      <location filename="../plugin/stations.py" line="160" />
      <source>no geometry</source>
      <translation>keine Geometrie</translation>
    </message>
    <message>
      <location filename="../plugin/stations.py" line="80" />
      <source>no {}</source>
      <translation>kein(e) {}</translation>
    </message>
    <message>
      <location filename="../plugin/stations.py" line="166" />
      <source>position not transformable</source>
      <translation>Position nicht transformierbar</translation>
    </message>
  </context>
  <context>
    <name>TerrainCorrectionAlgorithm</name>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="52" />
      <source>&lt;p&gt;Computes the terrain correction of every station (mGal, positive for relief above or below the station) and adds &lt;b&gt;tc_inner&lt;/b&gt;, &lt;b&gt;tc_outer&lt;/b&gt;, &lt;b&gt;tc_total&lt;/b&gt;, &lt;b&gt;dem_diff&lt;/b&gt; (station height minus DEM height, m: large values point to mislocated stations), &lt;b&gt;tc_cover&lt;/b&gt; (fraction of the zone area covered by the rasters) and &lt;b&gt;qc_flag&lt;/b&gt; to a copy of the layer.&lt;/p&gt;&lt;p&gt;Exact engine (default): the innermost ring is modelled from the station height and the local DEM surface (or replaced by a field estimate); the inner zone to the inner radius uses exact prisms at full DEM resolution; the outer zone to the outer radius uses progressively coarser cells, then the regional raster beyond the fine one, with Earth curvature. Geographic (degree) rasters work: distances are on the ground.&lt;/p&gt;&lt;p&gt;Ring-and-sector (Hammer 1939): zones B to M with compartment mean heights from the DEM, for comparison with chart-based field practice; tc_total only, optionally one field per zone.&lt;/p&gt;&lt;p&gt;Station heights come from the height field (the height difference is always taken from the station's own height) or, when empty, from the DEM.&lt;/p&gt;&lt;p&gt;{}&lt;/p&gt;</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="84" />
      <source>Elevation raster (DEM, metres)</source>
      <translation>Höhenraster (DGM, Meter)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="109" />
      <source>Exact engine (prisms, DEM-driven)</source>
      <translation>Exaktes Verfahren (Prismen, aus dem DGM)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="90" />
      <source>Field-estimated innermost-ring correction (mGal)</source>
      <translation>Im Feld geschätzte Korrektion des innersten Rings (mGal)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="108" />
      <source>Method</source>
      <translation>Verfahren</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="109" />
      <source>Ring-and-sector (Hammer 1939 zones B-M)</source>
      <translation>Ringe und Sektoren (Hammer 1939, Zonen B-M)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="114" />
      <source>Ring-and-sector: one field per Hammer zone</source>
      <translation>Ringe und Sektoren: ein Feld je Hammer-Zone</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="77" />
      <source>Station height field (empty = sample the elevation raster)</source>
      <translation>Feld der Stationshöhe (leer = aus dem Höhenraster)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="123" />
      <source>Stations computed</source>
      <translation>Berechnete Stationen (Anzahl)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="124" />
      <source>Stations flagged</source>
      <translation>Markierte Stationen (Anzahl)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="120" />
      <source>Stations with terrain correction</source>
      <translation>Stationen mit Geländekorrektion</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="43" />
      <source>Terrain correction (inner and outer zones from elevation rasters)</source>
      <translation>Geländekorrektion (Innen- und Außenzone aus Höhenrastern)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="46" />
      <source>Terrain correction of gravity stations to 166.7 km from a DEM, with Earth curvature.</source>
      <translation>Geländekorrektion von Schwerestationen bis 166,7 km aus einem DGM, mit Erdkrümmung.</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="98" />
      <source>Treat cells below sea level as water of this density (kg/m³)</source>
      <translation>Zellen unter dem Meeresspiegel als Wasser dieser Dichte behandeln (kg/m³)</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="49" />
      <source>gravity,terrain correction,inner zone,outer zone,Hammer zones,DEM,Bouguer</source>
      <translation>Schwere,Geländekorrektion,Innenzone,Außenzone,Hammer-Zonen,DGM,Bouguer</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="138" />
      <source>innermost-ring correction</source>
      <translation>Korrektion des innersten Rings</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="137" />
      <source>station height</source>
      <translation>Stationshöhe</translation>
    </message>
    <message>
      <location filename="../plugin/toolbox/terrain_correction.py" line="201" />
      <source>{} stations: terrain correction computed for {}, {} flagged.</source>
      <translation>{} Stationen: Geländekorrektion für {} berechnet, {} markiert.</translation>
    </message>
  </context>
  <context>
    <name>TerrainRun</name>
    <message>
      <location filename="../plugin/terrain_run.py" line="143" />
      <source>Cancelled by the user.</source>
      <translation>Vom Benutzer abgebrochen.</translation>
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="33" />
      <source>No station lies on the {} (raster extent {:.6g}, {:.6g}, {:.6g}, {:.6g} in its own CRS). Check that the raster covers the survey and that both layers have the right CRS.</source>
      <translation type="unfinished" />
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="86" />
      <source>Reprojecting the regional elevation raster to the CRS of the fine one.</source>
      <translation>Das regionale Höhenraster wird in das KBS des feinen Rasters umprojiziert.</translation>
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="54" />
      <source>elevation raster</source>
      <translation>Höhenraster</translation>
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="161" />
      <source>height from DEM</source>
      <translation>Höhe aus DGM</translation>
    </message>
    <message>
      <location filename="../plugin/terrain_run.py" line="162" />
      <source>no height (outside DEM)</source>
      <translation>keine Höhe (außerhalb des DGM)</translation>
    </message>
  </context>
</TS>
