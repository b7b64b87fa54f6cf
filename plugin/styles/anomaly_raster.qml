<!DOCTYPE qgis PUBLIC 'http://mrcc.com/qgis.dtd' 'SYSTEM'>
<qgis version="3.22.16-Białowieża" maxScale="0" minScale="1e+08" styleCategories="AllStyleCategories" hasScaleBasedVisibilityFlag="0">
  <flags>
    <Identifiable>1</Identifiable>
    <Removable>1</Removable>
    <Searchable>1</Searchable>
    <Private>0</Private>
  </flags>
  <temporal mode="0" enabled="0" fetchMode="0">
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
      <resampling maxOversampling="2" enabled="false" zoomedOutResamplingMethod="nearestNeighbour" zoomedInResamplingMethod="nearestNeighbour"/>
    </provider>
    <rasterrenderer type="singlebandpseudocolor" classificationMin="0" opacity="1" nodataColor="" alphaBand="-1" band="1" classificationMax="1">
      <minMaxOrigin>
        <limits>CumulativeCut</limits>
        <extent>UpdatedCanvas</extent>
        <statAccuracy>Exact</statAccuracy>
        <cumulativeCutLower>0.02</cumulativeCutLower>
        <cumulativeCutUpper>0.98</cumulativeCutUpper>
        <stdDevFactor>2</stdDevFactor>
      </minMaxOrigin>
      <rastershader>
        <colorrampshader colorRampType="INTERPOLATED" classificationMode="1" labelPrecision="2" clip="0" minimumValue="0" maximumValue="1">
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
          <item value="0" label="0.00" alpha="255" color="#2b83ba"/>
          <item value="0.1" label="0.10" alpha="255" color="#5ea7b1"/>
          <item value="0.2" label="0.20" alpha="255" color="#91cba8"/>
          <item value="0.3" label="0.30" alpha="255" color="#bce4a9"/>
          <item value="0.4" label="0.40" alpha="255" color="#ddf1b4"/>
          <item value="0.5" label="0.50" alpha="255" color="#ffffbf"/>
          <item value="0.6" label="0.60" alpha="255" color="#fedf99"/>
          <item value="0.7" label="0.70" alpha="255" color="#fdbe74"/>
          <item value="0.8" label="0.80" alpha="255" color="#f59053"/>
          <item value="0.9" label="0.90" alpha="255" color="#e65538"/>
          <item value="1" label="1.00" alpha="255" color="#d7191c"/>
          <rampLegendSettings direction="0" maximumLabel="" suffix=" mGal" orientation="2" prefix="" useContinuousLegend="1" minimumLabel="">
            <numericFormat id="basic">
              <Option type="Map">
                <Option value="" type="QChar" name="decimal_separator"/>
                <Option value="2" type="int" name="decimals"/>
                <Option value="0" type="int" name="rounding_type"/>
                <Option value="false" type="bool" name="show_plus"/>
                <Option value="true" type="bool" name="show_thousand_separator"/>
                <Option value="false" type="bool" name="show_trailing_zeros"/>
                <Option value="" type="QChar" name="thousand_separator"/>
              </Option>
            </numericFormat>
          </rampLegendSettings>
        </colorrampshader>
      </rastershader>
    </rasterrenderer>
    <brightnesscontrast contrast="0" gamma="1" brightness="0"/>
    <huesaturation grayscaleMode="0" saturation="0" colorizeOn="0" colorizeRed="255" colorizeStrength="100" invertColors="0" colorizeBlue="128" colorizeGreen="128"/>
    <rasterresampler maxOversampling="2" zoomedOutResampler="bilinear" zoomedInResampler="bilinear"/>
    <resamplingStage>resamplingFilter</resamplingStage>
  </pipe>
  <blendMode>0</blendMode>
</qgis>
