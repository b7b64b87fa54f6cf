# Relief Gravity developer targets (GNU make). The two README commands need no make.
PROFILE ?= $(HOME)/.local/share/QGIS/QGIS3/profiles/default
PLUGINS = $(PROFILE)/python/plugins

.PHONY: test demo zip install uninstall i18n

test:
	bash tools/test.sh

demo:
	bash tools/demo.sh

zip: i18n
	/usr/bin/python3 tools/build_zip.py dist

# Installs the built zip into the user's QGIS profile and enables it.
install: zip
	mkdir -p "$(PLUGINS)"
	rm -rf "$(PLUGINS)/relief_gravity"
	zip="$$(ls -t $(CURDIR)/dist/relief_gravity-*.zip | head -1)" && cd "$(PLUGINS)" && /usr/bin/python3 -m zipfile -e "$$zip" .
	QT_QPA_PLATFORM=offscreen qgis_process.bin plugins enable relief_gravity

uninstall:
	rm -rf "$(PLUGINS)/relief_gravity"

i18n:
	/usr/bin/python3 tools/update_translations.py
