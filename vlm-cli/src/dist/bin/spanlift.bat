@echo off
rem Spanlift launcher for Windows: runs lib\spanlift.jar of the unpacked release archive with the Java runtime
rem named by JAVA_HOME, else the first java on PATH, after checking that it is Java 17 or later.
rem JAVA_OPTS, when set, is passed to java before the program's own options.
setlocal

set "SPANLIFT_HOME=%~dp0.."
set "SPANLIFT_JAR=%SPANLIFT_HOME%\lib\spanlift.jar"

set "JAVA_EXE=java.exe"
if not defined JAVA_HOME goto runs
set "JAVA_EXE=%JAVA_HOME%\bin\java.exe"
if exist "%JAVA_EXE%" goto runs
echo spanlift: JAVA_HOME has no bin\java.exe; set it to a Java 17 or later runtime, or unset it 1>&2
exit /b 2

:runs
"%JAVA_EXE%" -fullversion >nul 2>&1
if not errorlevel 1 goto version
echo spanlift: no Java found; install a Java 17 or later runtime, or set JAVA_HOME to one 1>&2
exit /b 2

:version
rem "java -fullversion" prints: openjdk full version "17.0.15+6" (or "1.8.0_292-b10" for Java 8).
set "JAVA_MAJOR="
set "JAVA_MINOR="
for /f tokens^=2-3^ delims^=.-_+^" %%a in ('call "%JAVA_EXE%" -fullversion 2^>^&1') do (
    if not defined JAVA_MAJOR set "JAVA_MAJOR=%%a"
    if not defined JAVA_MINOR set "JAVA_MINOR=%%b"
)
if "%JAVA_MAJOR%"=="1" set "JAVA_MAJOR=%JAVA_MINOR%"
set "JAVA_MAJOR_NUMBER=0"
set /a "JAVA_MAJOR_NUMBER=%JAVA_MAJOR%" >nul 2>&1
if %JAVA_MAJOR_NUMBER% GEQ 17 goto jar
echo spanlift: needs Java 17 or later, but the java found is Java %JAVA_MAJOR%; set JAVA_HOME to a Java 17 or later runtime 1>&2
exit /b 2

:jar
if exist "%SPANLIFT_JAR%" goto run
echo spanlift: lib\spanlift.jar is missing; unpack the whole release archive 1>&2
exit /b 2

:run
set "SPANLIFT_TIER=-XX:TieredStopAtLevel=1"
if "%~1"=="sweep" set "SPANLIFT_TIER="
if "%~1"=="validate" set "SPANLIFT_TIER="
"%JAVA_EXE%" %JAVA_OPTS% -Djava.awt.headless=true -XX:+UseSerialGC %SPANLIFT_TIER% -jar "%SPANLIFT_JAR%" %*
exit /b %ERRORLEVEL%
