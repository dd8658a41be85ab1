Attribute VB_Name = "pumploss"
' pumploss for spreadsheets: declarations of the pumploss C API in pumploss.dll and a few
' worksheet functions that convert units at the edge and turn status codes into cell errors.
'
' For 64-bit hosts (VBA7, PtrSafe). Put pumploss.dll (the x64 build) next to the workbook or on
' the PATH, or write the full path after Lib. 32-bit hosts need the __stdcall build (CMake
' preset windows-x86-stdcall); the declarations stay the same.
'
' Conventions of the C API: doubles go in ByVal, results come back through ByRef doubles, the
' function value is the status (Long): 0 OK, 1-99 error (results are NaN; never put them in a
' cell), 100 and up a report (result valid, outside a stated assumption).
' Results are engineering estimates; defer to the pump maker's limits and local codes.
Option Explicit

' ---- declarations of the C functions ------------------------------------------------------
Private Declare PtrSafe Function pumploss_version_number Lib "pumploss.dll" () As Long
Private Declare PtrSafe Function pumploss_version Lib "pumploss.dll" () As LongPtr
Private Declare PtrSafe Function pumploss_status_message Lib "pumploss.dll" ( _
    ByVal status As Long) As LongPtr
Private Declare PtrSafe Function pumploss_unit_convert Lib "pumploss.dll" ( _
    ByVal x As Double, ByVal from_unit As String, ByVal to_unit As String, _
    ByRef out_value As Double) As Long
Private Declare PtrSafe Function pumploss_viscosity_d341 Lib "pumploss.dll" ( _
    ByVal t1_k As Double, ByVal nu1_m2_s As Double, ByVal t2_k As Double, _
    ByVal nu2_m2_s As Double, ByVal t_k As Double, ByRef nu_m2_s As Double) As Long
Private Declare PtrSafe Function pumploss_iso_vg Lib "pumploss.dll" ( _
    ByVal grade As Long, ByRef mid_m2_s As Double, ByRef min_m2_s As Double, _
    ByRef max_m2_s As Double) As Long

' C strings (static storage in the DLL) copied into VBA strings.
Private Declare PtrSafe Function lstrlenA Lib "kernel32" (ByVal p As LongPtr) As Long
Private Declare PtrSafe Sub CopyMemory Lib "kernel32" Alias "RtlMoveMemory" ( _
    ByVal dest As String, ByVal src As LongPtr, ByVal n As LongPtr)

' Cell error values (the numbers CVErr takes).
Private Const CELL_ERR_VALUE As Long = 2015  ' #VALUE!
Private Const CELL_ERR_NUM As Long = 2036    ' #NUM!
Private Const CELL_ERR_NA As Long = 2042     ' #N/A

' ---- status codes to cell values ------------------------------------------------------------
' OK and reports give the value; errors give a cell error, never the NaN behind it:
'   #NUM!   1 EDOMAIN, 2 ENONFINITE, 3 EOVERFLOW, 11 EVALIDITY  (the numbers are wrong)
'   #N/A    4 ENOCONVERGE, 12 EDATA                             (no answer from these data)
'   #VALUE! 5 EMISUSE, 6 EUNIT, 7 EDIMENSION, 8-10 and unknown  (the call itself is wrong)
Private Function StatusToCell(ByVal st As Long, ByVal v As Double) As Variant
    Select Case st
        Case 0
            StatusToCell = v
        Case Is >= 100
            StatusToCell = v
        Case 1, 2, 3, 11
            StatusToCell = CVErr(CELL_ERR_NUM)
        Case 4, 12
            StatusToCell = CVErr(CELL_ERR_NA)
        Case Else
            StatusToCell = CVErr(CELL_ERR_VALUE)
    End Select
End Function

Private Function CString(ByVal p As LongPtr) As String
    Dim n As Long
    If p = 0 Then Exit Function
    n = lstrlenA(p)
    CString = String$(n, vbNullChar)
    CopyMemory CString, p, n
End Function

' ---- worksheet functions ----------------------------------------------------------------------

' =PL_VERSION()  ->  "0.1.0"
Public Function PL_VERSION() As String
    PL_VERSION = CString(pumploss_version())
End Function

' =PL_MESSAGE(code)  ->  the sentence for a status code
Public Function PL_MESSAGE(ByVal code As Long) As String
    PL_MESSAGE = CString(pumploss_status_message(code))
End Function

' =PL_UNIT(250, "bar", "psi")  ->  3625.94 (unit symbols as in pumploss.h, case-sensitive)
Public Function PL_UNIT(ByVal x As Double, ByVal fromUnit As String, ByVal toUnit As String) As Variant
    Dim r As Double
    PL_UNIT = StatusToCell(pumploss_unit_convert(x, fromUnit, toUnit, r), r)
End Function

' Kinematic viscosity by ASTM D341 from two known points, in the units of a data sheet:
' =PL_VISCOSITY(40, 46, 100, 6.8, 60)  ->  20.62 (mm2/s at 60 degC)
Public Function PL_VISCOSITY(ByVal t1_degC As Double, ByVal nu1_cSt As Double, _
                             ByVal t2_degC As Double, ByVal nu2_cSt As Double, _
                             ByVal t_degC As Double) As Variant
    Dim nu As Double, st As Long
    st = pumploss_viscosity_d341(t1_degC + 273.15, nu1_cSt * 0.000001, t2_degC + 273.15, _
                                 nu2_cSt * 0.000001, t_degC + 273.15, nu)
    PL_VISCOSITY = StatusToCell(st, nu * 1000000#)
End Function

' The status of the same call, for a neighbouring cell or conditional formatting:
' =PL_VISCOSITY_STATUS(40, 46, 100, 6.8, 60)  ->  0
Public Function PL_VISCOSITY_STATUS(ByVal t1_degC As Double, ByVal nu1_cSt As Double, _
                                    ByVal t2_degC As Double, ByVal nu2_cSt As Double, _
                                    ByVal t_degC As Double) As Long
    Dim nu As Double
    PL_VISCOSITY_STATUS = pumploss_viscosity_d341(t1_degC + 273.15, nu1_cSt * 0.000001, _
        t2_degC + 273.15, nu2_cSt * 0.000001, t_degC + 273.15, nu)
End Function

' ISO 3448 grade limits in mm2/s at 40 degC: which = "mid", "min" or "max".
' =PL_ISO_VG(46, "min")  ->  41.4
Public Function PL_ISO_VG(ByVal grade As Long, ByVal which As String) As Variant
    Dim mid_ As Double, lo As Double, hi As Double, st As Long
    st = pumploss_iso_vg(grade, mid_, lo, hi)
    Select Case LCase$(which)
        Case "min": PL_ISO_VG = StatusToCell(st, lo * 1000000#)
        Case "max": PL_ISO_VG = StatusToCell(st, hi * 1000000#)
        Case Else: PL_ISO_VG = StatusToCell(st, mid_ * 1000000#)
    End Select
End Function
