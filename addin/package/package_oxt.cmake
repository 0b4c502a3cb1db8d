# Assemble tubeheat.oxt (a zip with the files at its root). Run by
# addin/CMakeLists.txt as `cmake -D... -P package_oxt.cmake`.
foreach(v STAGE OXT CONF PKG_SRC LICENSE XCU RDB COMPONENT LIB LIB_SONAME)
  if(NOT DEFINED ${v})
    message(FATAL_ERROR "package_oxt.cmake: ${v} not set")
  endif()
endforeach()

file(REMOVE_RECURSE ${STAGE})
file(MAKE_DIRECTORY ${STAGE}/META-INF)
file(COPY_FILE ${CONF}/manifest.xml ${STAGE}/META-INF/manifest.xml)
file(COPY_FILE ${CONF}/description.xml ${STAGE}/description.xml)
file(COPY_FILE ${CONF}/tubeheat.components ${STAGE}/tubeheat.components)
file(COPY_FILE ${PKG_SRC}/description-en.txt ${STAGE}/description-en.txt)
file(COPY_FILE ${LICENSE} ${STAGE}/LICENSE)
file(COPY_FILE ${XCU} ${STAGE}/CalcAddIns.xcu)
file(COPY_FILE ${RDB} ${STAGE}/tubeheat.rdb)
# The component loads libtubeheat by its SONAME through rpath $ORIGIN.
file(COPY_FILE ${COMPONENT} ${STAGE}/tubeheat_calc.so)
file(COPY_FILE ${LIB} ${STAGE}/${LIB_SONAME})
# Debug information is of no use inside the extension: ship it stripped.
if(STRIP)
  execute_process(COMMAND ${STRIP} --strip-debug ${STAGE}/tubeheat_calc.so ${STAGE}/${LIB_SONAME}
                  RESULT_VARIABLE strip_rc)
  if(NOT strip_rc EQUAL 0)
    message(FATAL_ERROR "strip failed")
  endif()
endif()

set(files META-INF/manifest.xml description.xml description-en.txt LICENSE
          tubeheat.components tubeheat.rdb CalcAddIns.xcu tubeheat_calc.so
          ${LIB_SONAME})
file(REMOVE ${OXT})
execute_process(
  COMMAND ${CMAKE_COMMAND} -E tar cf ${OXT} --format=zip -- ${files}
  WORKING_DIRECTORY ${STAGE}
  RESULT_VARIABLE rc)
if(NOT rc EQUAL 0)
  message(FATAL_ERROR "zipping ${OXT} failed")
endif()
