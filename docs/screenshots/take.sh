#!/usr/bin/env bash
# Retakes every screenshot of the desktop app under Xvfb (see docs/desktop.md).
# Needs: xvfb xauth libgtk-3-0 libgl1-mesa-dri (apt) and a built target/cohesa.jar.
set -euo pipefail
cd "$(dirname "$0")/../.."
out=docs/screenshots
home=$(mktemp -d)
shot() {   # shot NAME ARGS...
  local name=$1; shift
  COHESA_HOME="$home" xvfb-run -a -s "-screen 0 1400x900x24" \
    java -jar target/cohesa.jar --screenshot="$out/$name.png" "$@" 2>/dev/null
  echo "$out/$name.png"
}
sized() {   # sized NAME ARGS...: the screen at the two sizes the app is judged at
  local name=$1; shift
  for size in 1280x800 1920x1080; do
    COHESA_HOME="$home" xvfb-run -a -s "-screen 0 1940x1100x24" \
      java -jar target/cohesa.jar --size=$size --screenshot="$out/$name-$size.png" "$@" 2>/dev/null
    echo "$out/$name-$size.png"
  done
}
target="--target=18.5,9,8,8"   # an invented demo sphere
# a blend the search itself proposes for the demo sphere (its best blend of two components, #15 of cohesa blend --target 18.5,9,8,8 --max-components 3 --top 30)
proposed="--blend=cyclopentanone:0.727,2-butanol:0.273"
# an invented demo case (replace toluene): the first two candidates are chosen and checked
sized case-material --case=toluene --screen=target "$target"
sized case-limits --case=toluene --screen=limits "$target" --search=3
sized case-candidates --case=toluene --screen=blends "$target" --search=3
sized cases --screen=cases   # the case list: the demo case saved by the two runs above
sized case-checks --case=toluene --screen=checks "$target" --search=3
sized case-record --case=toluene --screen=record "$target" --search=3
sized blends --screen=blends "$target" --search=3
sized drying --screen=drying "$target" "$proposed"
sized space-3d --screen=space --view=3d "$target" --select=toluene "$proposed"
# the 3D view turned well away from its starting angle (δP towards the viewer, seen from higher up)
sized space-3d-turned --screen=space --view=3d "$target" --select=toluene "$proposed" --turn=115,18
shot library --screen=library --select=toluene
shot target --screen=target "$target"
shot blends --screen=blends "$target" --search=3
shot drying --screen=drying "$target" "--blend=acetone:0.3,n-butyl acetate:0.4,toluene:0.3"
shot space-3d --screen=space --view=3d "$target" --select=toluene "--blend=acetone:0.3,n-butyl acetate:0.4,toluene:0.3"
shot space-p-h --screen=space --view=p-h "$target" --select=toluene
shot space-d-h --screen=space --view=d-h "$target" --select=toluene
shot space-teas --screen=space --view=teas "$target" --select=toluene
# the register: the shared register on a throwaway local PostgreSQL server (docs/tools/local-postgres.sh), three
# invented records filed, reviewed and approved by three logins, shown to the third (four eyes holds against logins)
pg_dir="$(mktemp -d "${TMPDIR:-/tmp}/cohesa-shots-pg.XXXXXX")"
export COHESA_PG_PORT="${COHESA_PG_PORT:-54339}"
docs/tools/local-postgres.sh start "$pg_dir" >/dev/null
psql_bin="$(ls -d /usr/lib/postgresql/*/bin/psql 2>/dev/null | sort -V | tail -1)"
"$psql_bin" -q -h 127.0.0.1 -p "$COHESA_PG_PORT" -U postgres -c "CREATE DATABASE site_register" \
  -c "CREATE ROLE r_formulator LOGIN" -c "CREATE ROLE q_reviewer LOGIN" -c "CREATE ROLE m_manager LOGIN" >/dev/null
reg() { echo "postgresql://$1@127.0.0.1:$COHESA_PG_PORT/site_register"; }
cli() { COHESA_HOME="$home" java -jar target/cohesa.jar "$@" >/dev/null; }
cli record verify --register "$(reg postgres)" || true   # the owner's first connection sets the register up
"$psql_bin" -q -h 127.0.0.1 -p "$COHESA_PG_PORT" -U postgres -d site_register \
  -c "GRANT cohesa_register_writer TO r_formulator, q_reviewer, m_manager" >/dev/null
cli record add --register "$(reg r_formulator)" --process "Alkyd enamel thinner, line 2 (invented demo)" --site "Larchmere Coatings (fictional)" \
  --replaced toluene --replacement "n-butyl acetate:0.6,ethyl acetate:0.4" --reason "regulatory: reprotoxic aromatic (H361d)" \
  --author "R. Formulator" --material "medium-oil alkyd"
cli record review 1 --register "$(reg q_reviewer)" --by "Q. Reviewer" --comment "evidence complete"
cli record approve 1 --register "$(reg m_manager)" --by "M. Manager" --comment "lab trials passed"
cli record add --register "$(reg r_formulator)" --process "Extraction of OPL-114 (invented demo)" --site "Oakfield process lab (fictional)" \
  --replaced dichloromethane --replacement "2-methyltetrahydrofuran:1" --reason "safety: suspected carcinogen (H351)" \
  --author "P. Chemist" --target 17.8,7.5,7.0,7.0
cli record review 2 --register "$(reg q_reviewer)" --by "Q. Reviewer"
COHESA_REGISTER="$(reg m_manager)" shot register --screen=register
COHESA_REGISTER="$(reg m_manager)" sized register --screen=register
docs/tools/local-postgres.sh stop "$pg_dir"; rm -rf "$pg_dir"
rm -rf "$home"
