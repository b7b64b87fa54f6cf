<!DOCTYPE qgis PUBLIC 'http://mrcc.com/qgis.dtd' 'SYSTEM'>
<qgis maxScale="0" version="3.22.16-Białowieża" minScale="1e+08" hasScaleBasedVisibilityFlag="0" styleCategories="AllStyleCategories">
  <flags>
    <Identifiable>1</Identifiable>
    <Removable>1</Removable>
    <Searchable>1</Searchable>
    <Private>0</Private>
  </flags>
  <temporal mode="0" fetchMode="0" enabled="0">
    <fixedRange>
      <start></start>
      <end></end>
    </fixedRange>
  </temporal>
  <customproperties>
    <Option type="Map">
      <Option value="Value" type="QString" name="identify/format"/>
    </Option>
  </customproperties>
  <pipe-data-defined-properties>
    <Option type="Map">
      <Option value="" type="QString" name="name"/>
      <Option name="properties"/>
      <Option value="collection" type="QString" name="type"/>
    </Option>
  </pipe-data-defined-properties>
  <pipe>
    <provider>
      <resampling enabled="false" zoomedInResamplingMethod="nearestNeighbour" zoomedOutResamplingMethod="nearestNeighbour" maxOversampling="2"/>
    </provider>
    <rasterrenderer nodataColor="" alphaBand="-1" classificationMin="-18.013361587524415" band="1" type="singlebandpseudocolor" classificationMax="5.453832740783692" opacity="1">
      <minMaxOrigin>
        <limits>CumulativeCut</limits>
        <extent>WholeRaster</extent>
        <statAccuracy>Exact</statAccuracy>
        <cumulativeCutLower>0.02</cumulativeCutLower>
        <cumulativeCutUpper>0.98</cumulativeCutUpper>
        <stdDevFactor>2</stdDevFactor>
      </minMaxOrigin>
      <rastershader>
        <colorrampshader labelPrecision="1" clip="0" colorRampType="INTERPOLATED" maximumValue="5.4538327407836924" classificationMode="3" minimumValue="-18.013361587524415">
          <colorramp type="gradient" name="[source]">
            <Option type="Map">
              <Option value="43,131,186,255" type="QString" name="color1"/>
              <Option value="215,25,28,255" type="QString" name="color2"/>
              <Option value="0" type="QString" name="discrete"/>
              <Option value="gradient" type="QString" name="rampType"/>
              <Option value="0.25;171,221,164,255:0.5;255,255,191,255:0.75;253,174,97,255" type="QString" name="stops"/>
            </Option>
            <prop v="43,131,186,255" k="color1"/>
            <prop v="215,25,28,255" k="color2"/>
            <prop v="0" k="discrete"/>
            <prop v="gradient" k="rampType"/>
            <prop v="0.25;171,221,164,255:0.5;255,255,191,255:0.75;253,174,97,255" k="stops"/>
          </colorramp>
          <item label="-18.0" color="#2b83ba" value="-18.013361587524415" alpha="255"/>
          <item label="-11.1" color="#5ea7b1" value="-11.070613906860352" alpha="255"/>
          <item label="-7.4" color="#91cba8" value="-7.430793064117432" alpha="255"/>
          <item label="-6.0" color="#bce4a9" value="-5.955261600494385" alpha="255"/>
          <item label="-5.3" color="#ddf1b4" value="-5.31633464050293" alpha="255"/>
          <item label="-4.2" color="#ffffbf" value="-4.209261894226074" alpha="255"/>
          <item label="-2.0" color="#fedf99" value="-2.043854606628418" alpha="255"/>
          <item label="0.2" color="#fdbe74" value="0.222957225799561" alpha="255"/>
          <item label="1.5" color="#f59053" value="1.542641028404236" alpha="255"/>
          <item label="2.6" color="#e65538" value="2.616738109588622" alpha="255"/>
          <item label="5.5" color="#d7191c" value="5.453832740783692" alpha="255"/>
          <rampLegendSettings minimumLabel="" suffix=" mGal" useContinuousLegend="0" maximumLabel="" direction="0" prefix="" orientation="2">
            <numericFormat id="basic">
              <Option type="Map">
                <Option value="" type="QChar" name="decimal_separator"/>
                <Option value="1" type="int" name="decimals"/>
                <Option value="0" type="int" name="rounding_type"/>
                <Option value="false" type="bool" name="show_plus"/>
                <Option value="true" type="bool" name="show_thousand_separator"/>
                <Option value="true" type="bool" name="show_trailing_zeros"/>
                <Option value="" type="QChar" name="thousand_separator"/>
              </Option>
            </numericFormat>
          </rampLegendSettings>
        </colorrampshader>
      </rastershader>
    </rasterrenderer>
    <brightnesscontrast brightness="0" gamma="1" contrast="0"/>
    <huesaturation colorizeBlue="128" saturation="0" invertColors="0" colorizeRed="255" grayscaleMode="0" colorizeGreen="128" colorizeStrength="100" colorizeOn="0"/>
    <rasterresampler maxOversampling="2"/>
    <resamplingStage>resamplingFilter</resamplingStage>
  </pipe>
  <blendMode>0</blendMode>
</qgis>
