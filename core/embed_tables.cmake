# Writes a C++ file holding every resources/tables/*.csv as a string, so the programs carry
# their tables and cannot start with one missing. Run at build time when a table changes.
file(GLOB tables "${TABLE_DIR}/*.csv")
list(SORT tables)
set(body "")
set(count 0)
foreach(t IN LISTS tables)
  file(READ "${t}" text)
  get_filename_component(name "${t}" NAME)
  string(APPEND body "    {\"${name}\", R\"lwtable(${text})lwtable\"},\n")
  math(EXPR count "${count} + 1")
endforeach()
file(WRITE "${OUT}.tmp"
"// Generated from resources/tables by core/embed_tables.cmake; do not edit.\n"
"#include \"tables/embedded.h\"\n\n#include <array>\n\n"
"namespace lineward::tables {\nnamespace {\n"
"const std::array<EmbeddedFile, ${count}> kFiles{{\n${body}}};\n}\n"
"std::span<const EmbeddedFile> embeddedTableFiles() { return kFiles; }\n}\n")
execute_process(COMMAND ${CMAKE_COMMAND} -E copy_if_different "${OUT}.tmp" "${OUT}")
