@echo off
rem kitwright launcher for Windows: runs the jar built by "mvn package" (target\kitwright.jar of this checkout).
rem Put this folder (src\main\launcher) on the PATH. JAVA_OPTS (e.g. -Xmx8g) is honoured.
set "KITWRIGHT_JAR=%~dp0..\..\..\target\kitwright.jar"
if not exist "%KITWRIGHT_JAR%" (
  echo kitwright: %KITWRIGHT_JAR% is missing; build it first with: mvn -B package -DskipTests 1>&2
  exit /b 1
)
java %JAVA_OPTS% -jar "%KITWRIGHT_JAR%" %*
