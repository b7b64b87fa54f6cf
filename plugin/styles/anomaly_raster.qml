<!DOCTYPE qgis PUBLIC 'http://mrcc.com/qgis.dtd' 'SYSTEM'>
<qgis minScale="1e+08" hasScaleBasedVisibilityFlag="0" maxScale="0" version="3.22.16-Białowieża" styleCategories="AllStyleCategories">
  <flags>
    <Identifiable>1</Identifiable>
    <Removable>1</Removable>
    <Searchable>1</Searchable>
    <Private>0</Private>
  </flags>
  <temporal fetchMode="0" enabled="0" mode="0">
    <fixedRange>
      <start></start>
      <end></end>
    </fixedRange>
  </temporal>
  <customproperties>
    <Option type="Map">
      <Option type="QString" name="identify/format" value="Value"/>
    </Option>
  </customproperties>
  <pipe-data-defined-properties>
    <Option type="Map">
      <Option type="QString" name="name" value=""/>
      <Option name="properties"/>
      <Option type="QString" name="type" value="collection"/>
    </Option>
  </pipe-data-defined-properties>
  <pipe>
    <provider>
      <resampling enabled="false" zoomedInResamplingMethod="nearestNeighbour" maxOversampling="2" zoomedOutResamplingMethod="nearestNeighbour"/>
    </provider>
    <rasterrenderer opacity="1" type="singlebandpseudocolor" band="1" alphaBand="-1" classificationMax="1" nodataColor="" classificationMin="0">
      <minMaxOrigin>
        <limits>CumulativeCut</limits>
        <extent>UpdatedCanvas</extent>
        <statAccuracy>Exact</statAccuracy>
        <cumulativeCutLower>0.02</cumulativeCutLower>
        <cumulativeCutUpper>0.98</cumulativeCutUpper>
        <stdDevFactor>2</stdDevFactor>
      </minMaxOrigin>
      <rastershader>
        <colorrampshader labelPrecision="2" maximumValue="1" colorRampType="INTERPOLATED" minimumValue="0" clip="0" classificationMode="1">
          <colorramp type="gradient" name="[source]">
            <Option type="Map">
              <Option type="QString" name="color1" value="43,131,186,255"/>
              <Option type="QString" name="color2" value="215,25,28,255"/>
              <Option type="QString" name="discrete" value="0"/>
              <Option type="QString" name="rampType" value="gradient"/>
              <Option type="QString" name="stops" value="0.25;171,221,164,255:0.5;255,255,191,255:0.75;253,174,97,255"/>
            </Option>
            <prop k="color1" v="43,131,186,255"/>
            <prop k="color2" v="215,25,28,255"/>
            <prop k="discrete" v="0"/>
            <prop k="rampType" v="gradient"/>
            <prop k="stops" v="0.25;171,221,164,255:0.5;255,255,191,255:0.75;253,174,97,255"/>
          </colorramp>
          <item label="0.00" value="0" alpha="255" color="#2b83ba"/>
          <item label="0.10" value="0.1" alpha="255" color="#5ea7b1"/>
          <item label="0.20" value="0.2" alpha="255" color="#91cba8"/>
          <item label="0.30" value="0.3" alpha="255" color="#bce4a9"/>
          <item label="0.40" value="0.4" alpha="255" color="#ddf1b4"/>
          <item label="0.50" value="0.5" alpha="255" color="#ffffbf"/>
          <item label="0.60" value="0.6" alpha="255" color="#fedf99"/>
          <item label="0.70" value="0.7" alpha="255" color="#fdbe74"/>
          <item label="0.80" value="0.8" alpha="255" color="#f59053"/>
          <item label="0.90" value="0.9" alpha="255" color="#e65538"/>
          <item label="1.00" value="1" alpha="255" color="#d7191c"/>
          <rampLegendSettings useContinuousLegend="1" minimumLabel="" suffix=" mGal" maximumLabel="" direction="0" prefix="" orientation="2">
            <numericFormat id="basic">
              <Option type="Map">
                <Option type="QChar" name="decimal_separator" value=""/>
                <Option type="int" name="decimals" value="2"/>
                <Option type="int" name="rounding_type" value="0"/>
                <Option type="bool" name="show_plus" value="false"/>
                <Option type="bool" name="show_thousand_separator" value="true"/>
                <Option type="bool" name="show_trailing_zeros" value="false"/>
                <Option type="QChar" name="thousand_separator" value=""/>
              </Option>
            </numericFormat>
          </rampLegendSettings>
        </colorrampshader>
      </rastershader>
    </rasterrenderer>
    <brightnesscontrast gamma="1" contrast="0" brightness="0"/>
    <huesaturation colorizeGreen="128" colorizeOn="0" grayscaleMode="0" saturation="0" colorizeRed="255" invertColors="0" colorizeBlue="128" colorizeStrength="100"/>
    <rasterresampler zoomedOutResampler="bilinear" maxOversampling="2" zoomedInResampler="bilinear"/>
    <resamplingStage>resamplingFilter</resamplingStage>
  </pipe>
  <blendMode>0</blendMode>
</qgis>
